import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

export async function up({ context: q }: { context: MigrationContext }) {
  await q.createTable("outbox_messages", {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    // Nullable: some mail (sign-in help, system notices) belongs to no organization.
    organization_id: { type: DataTypes.UUID, references: { model: "organizations", key: "id" }, onDelete: "CASCADE" },
    to_address: { type: DataTypes.STRING(320), allowNull: false },
    subject: { type: DataTypes.STRING(300), allowNull: false },
    text_body: { type: DataTypes.TEXT, allowNull: false },
    html_body: { type: DataTypes.TEXT, allowNull: false },
    status: { type: DataTypes.STRING(10), allowNull: false, defaultValue: "queued" },
    attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    next_attempt_at: { type: DataTypes.DATE, allowNull: false },
    last_error: { type: DataTypes.TEXT },
    smtp_response: { type: DataTypes.TEXT },
    sent_at: { type: DataTypes.DATE },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await q.sequelize.query(
    `alter table outbox_messages add constraint outbox_messages_status_check check (status in ('queued','sent','failed'))`,
  );
  // The worker's only query: due queued rows, oldest first.
  await q.addIndex("outbox_messages", ["status", "next_attempt_at"], { name: "outbox_messages_status_next_attempt" });
}

export async function down({ context: q }: { context: MigrationContext }) {
  await q.dropTable("outbox_messages");
}
