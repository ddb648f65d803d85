import type { MigrationContext } from "@/lib/db/migrator";

// The desk reads the filings that could owe something today: a follow-up due (filings_follow_up), with
// the authority, a permit near its expiry, or a visit booked in the coming days. With an index for each
// of these the planner ORs them together instead of reading every filing of the company.
export async function up({ context: q }: { context: MigrationContext }) {
  await q.addIndex("filings", ["organization_id", "status"], { name: "filings_organization_status" });
  await q.addIndex("filings", ["organization_id", "expires_on"], {
    name: "filings_approved_permit_expiry",
    where: { kind: "permit", status: "approved" },
  });
  await q.addIndex("inspections", ["organization_id", "scheduled_for"], { name: "inspections_booked", where: { result: null } });
}

export async function down({ context: q }: { context: MigrationContext }) {
  await q.removeIndex("inspections", "inspections_booked");
  await q.removeIndex("filings", "filings_approved_permit_expiry");
  await q.removeIndex("filings", "filings_organization_status");
}
