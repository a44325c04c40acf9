// The standing safety reminder: short line always visible, the library's cautions on demand.
import { STAGE_SHEET_CAUTIONS } from '@/library/cautions';

export function SafetyNotice() {
  return (
    <details className="safety">
      <summary>
        <strong>⚠ Safety:</strong> hot parts, quench-oil fires, steam and cracking need the site's procedures. These results are planning estimates; local codes and qualified people decide.
      </summary>
      <ul>
        {STAGE_SHEET_CAUTIONS.map((c) => (
          <li key={c.id}>
            <strong>{c.topic}.</strong> {c.text}
          </li>
        ))}
      </ul>
    </details>
  );
}
