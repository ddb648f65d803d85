import { STAGE_LABELS, stageIndex, type Stage } from "@/lib/domain/stages";

/** Stage shown as a label with a fill bar of progress; colour stays neutral (green/amber/red mean review results only). */
export function StageBadge({ stage }: { stage: Stage }) {
  const done = stageIndex(stage) / (Object.keys(STAGE_LABELS).length - 1);
  return (
    <span className="inline-flex items-center gap-2 whitespace-nowrap text-sm">
      <span className="relative h-1.5 w-10 overflow-hidden rounded-full bg-paper-edge" aria-hidden>
        <span className="absolute inset-y-0 left-0 bg-copper" style={{ width: `${Math.max(8, done * 100)}%` }} />
      </span>
      {STAGE_LABELS[stage]}
    </span>
  );
}
