import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

const id = { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 };
const ref = (table: string, onDelete: "CASCADE" | "SET NULL", allowNull = onDelete === "SET NULL") => ({
  type: DataTypes.UUID,
  allowNull,
  references: { model: table, key: "id" },
  onDelete,
});
const stamps = { created_at: { type: DataTypes.DATE, allowNull: false }, updated_at: { type: DataTypes.DATE, allowNull: false } };

export async function up({ context: q }: { context: MigrationContext }) {
  // One filing per authority that must say yes; the permit and the interconnection application once each.
  await q.createTable("filings", {
    id,
    organization_id: { type: DataTypes.UUID, allowNull: false },
    project_id: ref("projects", "CASCADE"),
    kind: { type: DataTypes.STRING(20), allowNull: false },
    authority_kind: { type: DataTypes.STRING(20), allowNull: false },
    authority_id: { type: DataTypes.UUID, allowNull: true },
    authority_name: { type: DataTypes.STRING(160), allowNull: false },
    title: { type: DataTypes.STRING(160), allowNull: false, defaultValue: "" },
    status: { type: DataTypes.STRING(30), allowNull: false, defaultValue: "preparing" },
    status_since: { type: DataTypes.DATE, allowNull: false },
    reference_number: { type: DataTypes.STRING(80), allowNull: true },
    channel: { type: DataTypes.STRING(20), allowNull: true },
    sent_to: { type: DataTypes.STRING(200), allowNull: false, defaultValue: "" },
    packet_id: ref("packets", "SET NULL"),
    payment_id: ref("payments", "SET NULL"),
    submitted_on: { type: DataTypes.DATEONLY, allowNull: true },
    decided_on: { type: DataTypes.DATEONLY, allowNull: true },
    expires_on: { type: DataTypes.DATEONLY, allowNull: true },
    next_follow_up_on: { type: DataTypes.DATEONLY, allowNull: true },
    pto_on: { type: DataTypes.DATEONLY, allowNull: true },
    revision_needed_since: { type: DataTypes.DATE, allowNull: true },
    customer_since: { type: DataTypes.DATE, allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
    created_by_id: { type: DataTypes.UUID, allowNull: true },
    ...stamps,
  });
  await q.addIndex("filings", ["project_id", "kind"], {
    name: "filings_one_permit_one_interconnection",
    unique: true,
    where: { kind: ["permit", "interconnection"] },
  });
  await q.addIndex("filings", ["organization_id", "next_follow_up_on"], { name: "filings_follow_up" });

  // The authority's comments, round by round.
  await q.createTable("correction_rounds", {
    id,
    organization_id: { type: DataTypes.UUID, allowNull: false },
    filing_id: ref("filings", "CASCADE"),
    number: { type: DataTypes.INTEGER, allowNull: false },
    received_on: { type: DataTypes.DATEONLY, allowNull: false },
    letter_file_id: ref("project_files", "SET NULL"),
    revision_at_receipt: { type: DataTypes.INTEGER, allowNull: true },
    resubmitted_packet_id: ref("packets", "SET NULL"),
    answered_at: { type: DataTypes.DATE, allowNull: true },
    ...stamps,
  });
  await q.addIndex("correction_rounds", ["filing_id", "number"], { name: "correction_rounds_number", unique: true });

  // Inspections of the permit, and the utility's witness test or meter set.
  await q.createTable("inspections", {
    id,
    organization_id: { type: DataTypes.UUID, allowNull: false },
    filing_id: ref("filings", "CASCADE"),
    kind: { type: DataTypes.STRING(20), allowNull: false },
    scheduled_for: { type: DataTypes.DATEONLY, allowNull: true },
    time_window: { type: DataTypes.STRING(40), allowNull: false, defaultValue: "" },
    inspector_name: { type: DataTypes.STRING(120), allowNull: false, defaultValue: "" },
    result: { type: DataTypes.STRING(20), allowNull: true },
    result_on: { type: DataTypes.DATEONLY, allowNull: true },
    recorded_at: { type: DataTypes.DATE, allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
    reinspection_of_id: ref("inspections", "SET NULL"),
    ...stamps,
  });
  await q.addIndex("inspections", ["filing_id"], { name: "inspections_filing" });

  // A comment of a round or a correction of an inspection, each answered on its own.
  await q.createTable("filing_items", {
    id,
    organization_id: { type: DataTypes.UUID, allowNull: false },
    round_id: ref("correction_rounds", "CASCADE", true),
    inspection_id: ref("inspections", "CASCADE", true),
    position: { type: DataTypes.INTEGER, allowNull: false },
    text: { type: DataTypes.TEXT, allowNull: false },
    reference: { type: DataTypes.STRING(120), allowNull: false, defaultValue: "" },
    response: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
    design_revision: { type: DataTypes.INTEGER, allowNull: true },
    resolved: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    ...stamps,
  });
  await q.sequelize.query(
    `ALTER TABLE filing_items ADD CONSTRAINT filing_items_one_parent CHECK ((round_id IS NULL) <> (inspection_id IS NULL))`,
  );
  await q.addIndex("filing_items", ["round_id"], { name: "filing_items_round" });
  await q.addIndex("filing_items", ["inspection_id"], { name: "filing_items_inspection" });

  // The project keeps what the facts make of it, so lists filter without recomputing.
  await q.addColumn("projects", "hand_stage", { type: DataTypes.STRING(30), allowNull: true });
  await q.addColumn("projects", "hold_state", { type: DataTypes.STRING(20), allowNull: true });
  await q.addColumn("projects", "hold_reason", { type: DataTypes.TEXT, allowNull: false, defaultValue: "" });
  await q.addColumn("projects", "hold_since", { type: DataTypes.DATE, allowNull: true });
  await q.addColumn("projects", "waiting_on", { type: DataTypes.STRING(20), allowNull: true });
  await q.addColumn("projects", "waiting_since", { type: DataTypes.DATE, allowNull: true });
  await q.addColumn("projects", "permit_status", { type: DataTypes.STRING(30), allowNull: true });
  await q.addColumn("projects", "interconnection_status", { type: DataTypes.STRING(30), allowNull: true });
  // Stages set before filings existed were set by hand: they stand until the facts pass them.
  await q.sequelize.query(`UPDATE projects SET hand_stage = stage`);
  await q.sequelize.query(`UPDATE projects SET waiting_on = 'office', waiting_since = created_at`);
  await q.addIndex("projects", ["organization_id", "waiting_on"], { name: "projects_waiting_on" });
  await q.addColumn("stage_changes", "cause", { type: DataTypes.STRING(10), allowNull: false, defaultValue: "hand" });

  // What each authority's profile says about its filings.
  await q.addColumn("jurisdictions", "review_days", { type: DataTypes.INTEGER, allowNull: false, defaultValue: 10 });
  await q.addColumn("jurisdictions", "permit_valid_days", { type: DataTypes.INTEGER, allowNull: false, defaultValue: 180 });
  await q.addColumn("jurisdictions", "required_inspections", { type: DataTypes.JSONB, allowNull: false, defaultValue: ["final"] });
  await q.addColumn("utilities", "review_days", { type: DataTypes.INTEGER, allowNull: false, defaultValue: 15 });
  await q.addColumn("utilities", "required_inspections", { type: DataTypes.JSONB, allowNull: false, defaultValue: [] });
}

export async function down({ context: q }: { context: MigrationContext }) {
  for (const column of ["review_days", "required_inspections"]) await q.removeColumn("utilities", column);
  for (const column of ["review_days", "permit_valid_days", "required_inspections"]) await q.removeColumn("jurisdictions", column);
  await q.removeColumn("stage_changes", "cause");
  await q.removeIndex("projects", "projects_waiting_on");
  for (const column of [
    "hand_stage",
    "hold_state",
    "hold_reason",
    "hold_since",
    "waiting_on",
    "waiting_since",
    "permit_status",
    "interconnection_status",
  ])
    await q.removeColumn("projects", column);
  await q.dropTable("filing_items");
  await q.dropTable("inspections");
  await q.dropTable("correction_rounds");
  await q.dropTable("filings");
}
