// What is wrong with a file or link, field by field, and the promise that nothing changed.
import type { PlanIssue } from '@/schema/parsePlan';

export function PlanIssueList({ title, issues }: { title: string; issues: PlanIssue[] }) {
  return (
    <div className="cs-exchange-issues" role="alert" data-testid="exchange-issues">
      <strong>{title}</strong> Nothing was changed.
      <ul>
        {issues.map((i, n) => (
          <li key={n}>
            <code>{i.path}</code>: {i.message}
          </li>
        ))}
      </ul>
    </div>
  );
}
