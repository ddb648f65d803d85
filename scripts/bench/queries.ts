// `npm run bench:queries` (scripts/bench/queries.mjs starts the scale profile's services): the SQL
// behind each read the benchmarks drive, on the scale profile: how many statements each call sends,
// and PostgreSQL's EXPLAIN ANALYZE of each (its plan's top line and time), so a sequential scan, a
// count over the whole table or a repeated read shows before any load is put on the server.
// `-- --plan "desk"` prints the whole plan of each statement of the reads so named.
import { QueryTypes } from "sequelize";
import { getActiveViewer } from "@/lib/server/data/users";
import { getProjectById, listProjects, listStageChanges } from "@/lib/server/data/projects";
import { getDesignStatus } from "@/lib/server/data/designs";
import { getFieldSummary } from "@/lib/server/data/commissioning";
import { getOrganization } from "@/lib/server/data/organizations";
import { getDesk } from "@/lib/server/data/desk";
import { db } from "@/lib/server/db";
import { ProjectListQuery } from "@/lib/schemas/project";

const sequelize = db() as unknown as { options: { logging?: false | ((sql: string) => void) } };

async function sqlOf(work: () => Promise<unknown>): Promise<string[]> {
  const sql: string[] = [];
  sequelize.options.logging = (statement: string) => void sql.push(statement.replace(/^Executing \(default\): /, ""));
  try {
    await work();
  } finally {
    sequelize.options.logging = false;
  }
  return sql;
}

async function explain(statement: string): Promise<string> {
  const rows = await db().query<{ "QUERY PLAN": string }>(`EXPLAIN (ANALYZE, BUFFERS OFF) ${statement}`, { type: QueryTypes.SELECT });
  const plan = rows.map((r) => r["QUERY PLAN"]);
  const scans = plan.filter((l) => /Seq Scan|Index Scan|Index Only Scan|Bitmap Index Scan/.test(l)).map((l) => l.trim().split("  ")[0]);
  const time = plan.find((l) => l.startsWith("Execution Time"));
  return `${time}; ${[...new Set(scans)].join(", ")}`;
}

const [{ id: userId }] = await db().query<{ id: string }>("select id from users where email = 'dana@quillmoor.example'", {
  type: QueryTypes.SELECT,
});
const viewer = (await getActiveViewer(userId))!;
const list = (q: Record<string, string>) => () => listProjects({ viewer, query: ProjectListQuery.parse({ pageSize: "50", ...q }) });
const first = (await list({ stage: "permit_filed" })()).items[0]!;
const calls: [string, () => Promise<unknown>][] = [
  ["session's viewer", () => getActiveViewer(userId)],
  ["organization (layout)", () => getOrganization({ viewer })],
  ["list, first page", list({})],
  ["list, page 100", list({ page: "100" })],
  ["list sorted by customerName", list({ sort: "customerName", direction: "asc" })],
  ["list sorted by stage", list({ sort: "stage" })],
  ["list sorted by waitingSince", list({ sort: "waitingSince" })],
  ["list filtered by stage", list({ stage: "permit_issued" })],
  ["list searched by name", list({ q: first.customerName.split(" ").at(-1)! })],
  ["list searched by address", list({ q: first.street.split(" ").slice(1).join(" ") })],
  ["list searched by account number", list({ q: first.utilityAccountNumber!.slice(0, 7) })],
  ["one project", () => getProjectById({ viewer, projectId: first.id })],
  ["project page's timeline", () => listStageChanges({ viewer, projectId: first.id })],
  ["project page's design status", () => getDesignStatus({ viewer, projectId: first.id })],
  ["project page's field summary", () => getFieldSummary({ viewer, projectId: first.id })],
  ["dashboard's desk (coordinator)", () => getDesk({ viewer })],
];
// --plan <text>: the whole EXPLAIN ANALYZE of each statement of the reads whose name contains the text.
const planOf = process.argv.includes("--plan") ? process.argv[process.argv.indexOf("--plan") + 1] : null;
for (const [name, call] of calls) {
  const statements = await sqlOf(call);
  console.log(`\n${name}: ${statements.length} statement${statements.length === 1 ? "" : "s"}`);
  for (const s of statements) {
    console.log(`  ${(await explain(s.replace(/;$/, ""))).padEnd(70)} ${s.slice(0, 110)}`);
    if (planOf && name.includes(planOf)) {
      const rows = await db().query<{ "QUERY PLAN": string }>(`EXPLAIN ANALYZE ${s.replace(/;$/, "")}`, { type: QueryTypes.SELECT });
      console.log(`\n${s}\n${rows.map((r) => r["QUERY PLAN"]).join("\n")}\n`);
    }
  }
}
await db().close();
