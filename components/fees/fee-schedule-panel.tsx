import type { FeeLine } from "@/lib/fees";
import type { FeeAuthorityKind } from "@/lib/fees/types";
import type { SaveFeeSchedule } from "./fee-schedule-editor";
import { FeeScheduleEditor } from "./fee-schedule-editor-lazy";

const WHAT_IT_CHARGES: Record<FeeAuthorityKind, string> = {
  jurisdiction: "The permit fees this AHJ charges",
  utility: "The interconnection fees this utility charges",
};

/** The "Fee schedule" panel of an AHJ's or a utility's settings page. */
export function FeeSchedulePanel({
  authorityKind,
  authorityId,
  authorityName,
  initialLines,
  save,
}: {
  authorityKind: FeeAuthorityKind;
  authorityId: string;
  authorityName: string;
  initialLines: FeeLine[];
  /** The page's server action that saves the schedule. */
  save: SaveFeeSchedule;
}) {
  return (
    <section className="panel space-y-3" aria-labelledby="fee-schedule-title">
      <h2 id="fee-schedule-title">Fee schedule</h2>
      <p className="text-sm text-ink-soft">
        {WHAT_IT_CHARGES[authorityKind]}, worked out for each project from its reviewed design and declared valuation; lines sharing a name
        are versions of one fee, told apart by the day each takes effect.
      </p>
      <FeeScheduleEditor
        authorityKind={authorityKind}
        authorityId={authorityId}
        authorityName={authorityName}
        initialLines={initialLines}
        save={save}
      />
    </section>
  );
}
