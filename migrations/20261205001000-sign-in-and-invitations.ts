import type { MigrationContext } from "@/lib/db/migrator";

// An address may be invited by more than one organization (so an invitation never tells an admin that the
// address is used elsewhere); only one account per address may hold a password while active.
export async function up({ context: q }: { context: MigrationContext }) {
  await q.sequelize.query(`alter table users drop constraint users_email_key`);
  await q.sequelize.query(`create unique index users_organization_email on users (organization_id, email)`);
  await q.sequelize.query(`create unique index users_signing_in_email on users (email) where password_hash is not null and is_active`);
  await q.sequelize.query(`create index users_email on users (email)`);
}

export async function down({ context: q }: { context: MigrationContext }) {
  // One address per account again: invitations that never set a password give way, and any other
  // duplicate keeps its row under a marked address so that nothing it owns is lost.
  await q.sequelize.query(
    `delete from users u where u.password_hash is null and exists (select 1 from users v where v.email = u.email and v.id <> u.id)`,
  );
  await q.sequelize.query(
    `update users u set email = left(u.email, 200) || '.duplicate-' || left(u.id::text, 8) where exists (select 1 from users v where v.email = u.email and v.id <> u.id and (v.is_active, v.updated_at, v.id) > (u.is_active, u.updated_at, u.id))`,
  );
  await q.sequelize.query(`drop index users_email`);
  await q.sequelize.query(`drop index users_signing_in_email`);
  await q.sequelize.query(`drop index users_organization_email`);
  await q.sequelize.query(`alter table users add constraint users_email_key unique (email)`);
}
