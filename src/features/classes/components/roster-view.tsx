import type { Roster } from "@contracts/roster";

/** The roster as a plain numbered list, for the head of department's read-only view. */
export function RosterView({ roster }: { roster: Roster }) {
  if (roster.names.length === 0) {
    return <p className="text-ink-muted">No names on this roster.</p>;
  }
  return (
    <ol className="grid gap-x-6 gap-y-1 sm:grid-cols-2 lg:grid-cols-3">
      {roster.names.map((name, index) => (
        <li key={name.id} className="flex gap-3 border-b border-line py-2">
          <span className="w-7 text-right font-mono text-ink-muted" aria-hidden="true">
            {index + 1}
          </span>
          <span>{name.displayName}</span>
        </li>
      ))}
    </ol>
  );
}
