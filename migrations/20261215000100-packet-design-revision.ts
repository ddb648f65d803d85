import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

export async function up({ context: q }: { context: MigrationContext }) {
  // The design revision a packet was drawn from: the Documents page tells which revisions no longer
  // match the design. Packets made before this column say nothing either way.
  await q.addColumn("packets", "design_revision", { type: DataTypes.INTEGER, allowNull: true });
  // The authorities a revision went to: a sent revision is kept exactly as it went in.
  await q.addColumn("packets", "sent_to", { type: DataTypes.JSONB, allowNull: false, defaultValue: [] });
  await q.sequelize.query(`
    update packets p set sent_to = coalesce((
      select jsonb_agg(distinct f.authority_name) from filings f
      where f.packet_id = p.id or exists (
        select 1 from correction_rounds r where r.filing_id = f.id and r.resubmitted_packet_id = p.id)
    ), '[]'::jsonb)`);
}

export async function down({ context: q }: { context: MigrationContext }) {
  await q.removeColumn("packets", "sent_to");
  await q.removeColumn("packets", "design_revision");
}
