import type { MigrationContext } from "@/lib/db/migrator";

// Searching the projects list matches any part of a name, street, town or utility account number
// (ILIKE '%…%'), which a b-tree cannot serve: trigram GIN indexes (PostgreSQL's pg_trgm contrib
// extension, trusted, so the database owner may create it) let the planner answer each branch of the
// search from an index instead of reading every project. The b-tree indexes serve each sort of the
// list within one organization, so a page is read in order instead of sorting the company's projects.
const TRIGRAM_COLUMNS = ["customer_name", "street", "city", "utility_account_number"] as const;
const SORT_COLUMNS = ["customer_name", "city", "stage_changed_at", "waiting_since", "created_at", "number"] as const;

export async function up({ context: q }: { context: MigrationContext }) {
  const sql = q.sequelize;
  await sql.query("CREATE EXTENSION IF NOT EXISTS pg_trgm");
  for (const column of TRIGRAM_COLUMNS) {
    await sql.query(`CREATE INDEX projects_${column}_trigram ON projects USING gin (${column} gin_trgm_ops)`);
  }
  for (const column of SORT_COLUMNS) {
    await q.addIndex("projects", ["organization_id", column], { name: `projects_organization_${column}` });
  }
}

export async function down({ context: q }: { context: MigrationContext }) {
  for (const column of SORT_COLUMNS) await q.removeIndex("projects", `projects_organization_${column}`);
  for (const column of TRIGRAM_COLUMNS) await q.sequelize.query(`DROP INDEX IF EXISTS projects_${column}_trigram`);
  // The extension stays: dropping it would break any other index built on it since.
}
