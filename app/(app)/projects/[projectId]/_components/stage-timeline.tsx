import { LocalTime } from "@/components/time/local-time";
import type { StageChangeDto } from "@/lib/dto/projects";

export function StageTimeline({ entries }: { entries: StageChangeDto[] }) {
  return (
    <ol className="relative space-y-4 border-l border-paper-edge pl-4" data-testid="stage-timeline">
      {[...entries].reverse().map((entry) => (
        <li key={entry.id} className="relative">
          <span className="absolute -left-[1.32rem] top-1.5 h-2.5 w-2.5 rounded-full border-2 border-copper bg-paper" aria-hidden />
          <p className="text-sm font-medium">{entry.toLabel}</p>
          <p className="text-xs text-ink-faint">
            <LocalTime iso={entry.createdAt} />
            {entry.changedBy ? ` · ${entry.changedBy}` : ""}
          </p>
          {entry.note ? <p className="mt-1 text-sm text-ink-soft">{entry.note}</p> : null}
        </li>
      ))}
    </ol>
  );
}
