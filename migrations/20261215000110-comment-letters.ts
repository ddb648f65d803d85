import type { MigrationContext } from "@/lib/db/migrator";

export async function up({ context: q }: { context: MigrationContext }) {
  // An authority's comment letter is kept with the project's files and linked from its correction round.
  await q.sequelize.query(`alter table project_files drop constraint project_files_kind_check`);
  await q.sequelize.query(
    `alter table project_files add constraint project_files_kind_check check (kind in ('signed-completion','site-photo','comment-letter'))`,
  );
}

export async function down({ context: q }: { context: MigrationContext }) {
  await q.sequelize.query(`delete from project_files where kind = 'comment-letter'`);
  await q.sequelize.query(`alter table project_files drop constraint project_files_kind_check`);
  await q.sequelize.query(
    `alter table project_files add constraint project_files_kind_check check (kind in ('signed-completion','site-photo'))`,
  );
}
