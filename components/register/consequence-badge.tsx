import { type ConsequenceLevel, LADDER_COLOURS } from '@/lib/domain';

/** A consequence level as a colour square and its name; the name is always written, so colour is never the only cue. */
export function ConsequenceBadge({ level }: { level: ConsequenceLevel | null }) {
  if (!level) {
    return (
      <span className="inline-flex items-center gap-1.5 whitespace-nowrap text-sm text-ink-muted">
        <span aria-hidden className="h-2.5 w-2.5 shrink-0 rounded-[2px] border border-dashed border-ink-faint" />
        Not classified
      </span>
    );
  }
  return (
    <span className="inline-flex items-center gap-1.5 whitespace-nowrap text-sm font-semibold text-ink">
      <span
        aria-hidden
        className="h-2.5 w-2.5 shrink-0 rounded-[2px] ring-1 ring-black/10 ring-inset"
        style={{ backgroundColor: LADDER_COLOURS[level.colour].hex }}
      />
      {level.name}
    </span>
  );
}
