// The user's saved entries of one kind, each with its source or description and a Remove button.
export interface UserEntryListProps {
  title: string;
  entries: readonly { id: string; name: string; description: string }[];
  onRemove: (id: string) => void;
}

export function UserEntryList({ title, entries, onRemove }: UserEntryListProps) {
  return (
    <section aria-label={title}>
      <h3>{title}</h3>
      {entries.length === 0 ? (
        <p className="stage-muted">None saved yet.</p>
      ) : (
        <ul className="entry-list">
          {entries.map((e) => (
            <li key={e.id}>
              <strong>{e.name}</strong> <code>{e.id}</code>
              <span className="source-line"> {e.description}</span>{' '}
              <button type="button" onClick={() => onRemove(e.id)} aria-label={`Remove ${e.name} from my library`}>
                Remove
              </button>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
