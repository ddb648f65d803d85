import type { MigrationContext } from "@/lib/db/migrator";

export async function up({ context: q }: { context: MigrationContext }) {
  // Batteries join the catalog as their own kind; their figures live in specs like every other kind's.
  await q.sequelize.query(`alter table equipment drop constraint equipment_kind_check`);
  await q.sequelize.query(
    `alter table equipment add constraint equipment_kind_check check (kind in ('module','inverter','device','battery'))`,
  );
}

export async function down({ context: q }: { context: MigrationContext }) {
  await q.sequelize.query(`delete from equipment where kind = 'battery'`);
  await q.sequelize.query(`alter table equipment drop constraint equipment_kind_check`);
  await q.sequelize.query(`alter table equipment add constraint equipment_kind_check check (kind in ('module','inverter','device'))`);
}
