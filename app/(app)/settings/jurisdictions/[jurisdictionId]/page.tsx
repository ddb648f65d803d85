import type { Metadata } from "next";
import Link from "next/link";
import { requirePermission } from "@/lib/server/auth";
import { orNotFoundPage } from "@/lib/server/pages";
import { getFeeSchedule } from "@/lib/server/data/fee-schedules";
import { getJurisdictionById } from "@/lib/server/data/reference-data";
import { FeeSchedulePanel } from "@/components/fees/fee-schedule-panel";
import { saveFeeScheduleAction } from "../../fee-schedule-actions";
import { JurisdictionForm } from "../_components/jurisdiction-form";

export const metadata: Metadata = { title: "Edit jurisdiction" };

export default async function EditJurisdictionPage({ params }: { params: Promise<{ jurisdictionId: string }> }) {
  const viewer = await requirePermission("reference:edit");
  const j = await orNotFoundPage(getJurisdictionById({ viewer, jurisdictionId: (await params).jurisdictionId }));
  const feeLines = await getFeeSchedule({ viewer, authorityKind: "jurisdiction", authorityId: j.id });
  const initial = { name: j.name, state: j.state, necEdition: String(j.necEdition), recordLowTempC: String(j.recordLowTempC), highDesignTempC: String(j.highDesignTempC), notes: j.notes };
  return (
    <div className="mx-auto max-w-3xl space-y-4">
      <p className="text-sm">
        <Link href="/settings/jurisdictions">Back to the jurisdictions</Link>
      </p>
      <h1>{j.name}</h1>
      <section className="panel">
        <JurisdictionForm jurisdictionId={j.id} initial={initial} />
      </section>
      <FeeSchedulePanel authorityKind="jurisdiction" authorityId={j.id} authorityName={j.name} initialLines={feeLines} save={saveFeeScheduleAction} />
    </div>
  );
}
