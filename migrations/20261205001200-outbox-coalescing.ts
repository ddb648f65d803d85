import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

export async function up({ context: q }: { context: MigrationContext }) {
  // A message held briefly so that later news of the same thing joins it (a burst of stage changes
  // on one project becomes one e-mail per person).
  await q.addColumn("outbox_messages", "coalesce_key", { type: DataTypes.STRING(200), allowNull: true });
  await q.sequelize.query(
    `create index outbox_messages_held on outbox_messages (coalesce_key) where status = 'queued' and coalesce_key is not null`,
  );
}

export async function down({ context: q }: { context: MigrationContext }) {
  await q.sequelize.query(`drop index if exists outbox_messages_held`);
  await q.removeColumn("outbox_messages", "coalesce_key");
}
