import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

export async function up({ context: q }: { context: MigrationContext }) {
  // What the owner declares the work is worth; some fees are a percentage of it.
  await q.addColumn("projects", "declared_valuation_cents", { type: DataTypes.BIGINT });

  // One schedule per AHJ or utility; its lines (versions by effective date) as JSON checked by lib/schemas/fee-schedule.
  await q.createTable("fee_schedules", {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    organization_id: { type: DataTypes.UUID, allowNull: false, references: { model: "organizations", key: "id" }, onDelete: "CASCADE" },
    authority_kind: { type: DataTypes.STRING(12), allowNull: false },
    authority_id: { type: DataTypes.UUID, allowNull: false },
    lines: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    updated_by_id: { type: DataTypes.UUID, references: { model: "users", key: "id" }, onDelete: "SET NULL" },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await q.sequelize.query(
    `alter table fee_schedules add constraint fee_schedules_kind_check check (authority_kind in ('jurisdiction','utility'))`,
  );
  await q.addIndex("fee_schedules", ["authority_kind", "authority_id"], { unique: true, name: "fee_schedules_authority" });

  // One attempt to pay some fee lines; the amount was worked out on the server and the processor's ids tie it to the charge.
  await q.createTable("payments", {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    organization_id: { type: DataTypes.UUID, allowNull: false, references: { model: "organizations", key: "id" }, onDelete: "CASCADE" },
    project_id: { type: DataTypes.UUID, allowNull: false, references: { model: "projects", key: "id" }, onDelete: "CASCADE" },
    status: { type: DataTypes.STRING(20), allowNull: false, defaultValue: "pending" },
    amount_cents: { type: DataTypes.INTEGER, allowNull: false },
    refunded_cents: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    currency: { type: DataTypes.STRING(3), allowNull: false, defaultValue: "usd" },
    checkout_session_id: { type: DataTypes.STRING(255), unique: true },
    payment_intent_id: { type: DataTypes.STRING(255), unique: true },
    card_brand: { type: DataTypes.STRING(40) },
    card_last4: { type: DataTypes.STRING(4) },
    failure_message: { type: DataTypes.TEXT },
    receipt_number: { type: DataTypes.STRING(40), unique: true },
    receipt_key: { type: DataTypes.STRING(300) },
    paid_at: { type: DataTypes.DATE },
    created_by_id: { type: DataTypes.UUID, references: { model: "users", key: "id" }, onDelete: "SET NULL" },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await q.sequelize.query(
    `alter table payments add constraint payments_status_check check (status in ('pending','paid','expired','partially_refunded','refunded'))`,
  );
  await q.sequelize.query(
    `alter table payments add constraint payments_amounts_check check (amount_cents > 0 and refunded_cents >= 0 and refunded_cents <= amount_cents)`,
  );
  await q.addIndex("payments", ["project_id", "created_at"], { name: "payments_project_time" });

  // The fee lines a payment covers, frozen as they were worked out when it was made.
  await q.createTable("payment_lines", {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    payment_id: { type: DataTypes.UUID, allowNull: false, references: { model: "payments", key: "id" }, onDelete: "CASCADE" },
    fee_key: { type: DataTypes.STRING(200), allowNull: false },
    authority: { type: DataTypes.STRING(200), allowNull: false },
    name: { type: DataTypes.STRING(200), allowNull: false },
    arithmetic: { type: DataTypes.JSONB, allowNull: false },
    amount_cents: { type: DataTypes.INTEGER, allowNull: false },
  });
  await q.addIndex("payment_lines", ["payment_id"], { name: "payment_lines_payment" });

  await q.createTable("refunds", {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    payment_id: { type: DataTypes.UUID, allowNull: false, references: { model: "payments", key: "id" }, onDelete: "CASCADE" },
    processor_refund_id: { type: DataTypes.STRING(255), allowNull: false, unique: true },
    amount_cents: { type: DataTypes.INTEGER, allowNull: false },
    reason: { type: DataTypes.TEXT },
    created_by_id: { type: DataTypes.UUID, references: { model: "users", key: "id" }, onDelete: "SET NULL" },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });

  // Every processor event handled, by its id: a repeat delivery finds its id here and changes nothing.
  await q.createTable("processor_events", {
    id: { type: DataTypes.STRING(255), primaryKey: true },
    type: { type: DataTypes.STRING(100), allowNull: false },
    received_at: { type: DataTypes.DATE, allowNull: false },
  });

  // Files the outbox attaches when it sends (e.g. a receipt), by their storage key.
  await q.addColumn("outbox_messages", "attachments", { type: DataTypes.JSONB, allowNull: false, defaultValue: [] });
}

export async function down({ context: q }: { context: MigrationContext }) {
  await q.removeColumn("outbox_messages", "attachments");
  await q.dropTable("processor_events");
  await q.dropTable("refunds");
  await q.dropTable("payment_lines");
  await q.dropTable("payments");
  await q.dropTable("fee_schedules");
  await q.removeColumn("projects", "declared_valuation_cents");
}
