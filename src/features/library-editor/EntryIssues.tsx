// What the library door said about an entry: saved, or each refused field with its reason.
import type { LibraryEntryIssue } from '@/library/parseLibraryEntry';

export type SaveOutcome = { kind: 'saved'; name: string } | { kind: 'refused'; issues: LibraryEntryIssue[] } | null;

export function EntryIssues({ outcome }: { outcome: SaveOutcome }) {
  if (!outcome) return null;
  if (outcome.kind === 'saved') return <p role="status">✔ Saved “{outcome.name}” to your library; it is now in the library pickers.</p>;
  return (
    <div role="alert" className="entry-issues">
      <p>⚠ Not saved. Fix these fields:</p>
      <ul>
        {outcome.issues.map((i) => (
          <li key={`${i.path}-${i.message}`}>
            <strong>{i.path}</strong>: {i.message}
          </li>
        ))}
      </ul>
    </div>
  );
}
