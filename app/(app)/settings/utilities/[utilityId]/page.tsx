import type { Metadata } from "next";
import Link from "next/link";
import { requirePermission } from "@/lib/server/auth";
import { orNotFoundPage } from "@/lib/server/pages";
import { getFeeSchedule } from "@/lib/server/data/fee-schedules";
import { getUtilityById } from "@/lib/server/data/reference-data";
import { FeeSchedulePanel } from "@/components/fees/fee-schedule-panel";
import { saveFeeScheduleAction } from "../../fee-schedule-actions";
import { UtilityForm } from "../_components/utility-form";

export const metadata: Metadata = { title: "Edit utility" };

export default async function EditUtilityPage({ params }: { params: Promise<{ utilityId: string }> }) {
  const viewer = await requirePermission("reference:edit");
  const u = await orNotFoundPage(getUtilityById({ viewer, utilityId: (await params).utilityId }));
  const feeLines = await getFeeSchedule({ viewer, authorityKind: "utility", authorityId: u.id });
  const initial = { name: u.name, serviceVoltages: u.serviceVoltages.join("\n"), acceptedGridProfiles: u.acceptedGridProfiles.join("\n"), notes: u.notes };
  return (
    <div className="mx-auto max-w-3xl space-y-4">
      <p className="text-sm">
        <Link href="/settings/utilities">Back to the utilities</Link>
      </p>
      <h1>{u.name}</h1>
      <section className="panel">
        <UtilityForm utilityId={u.id} initial={initial} />
      </section>
      <FeeSchedulePanel authorityKind="utility" authorityId={u.id} authorityName={u.name} initialLines={feeLines} save={saveFeeScheduleAction} />
    </div>
  );
}
