// The projects list reads a page's ids from the projects table alone and then only that page's rows
// with their joins. These tests hold it to the answer of the plain form it replaced (every project
// joined, counted and sorted in one statement, kept below as the reference) for every sort, direction,
// filter and search, and check that searches by name, address and account number use the trigram
// indexes (migration 20261215000200) rather than reading every project.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { QueryTypes } from "sequelize";
import { Design, Jurisdiction, Project, User, Utility } from "@/models";
import { nextActionFor, STAGES, type Stage } from "@/lib/domain/stages";
import type { Viewer } from "@/lib/domain/permissions";
import { PROJECT_SORTS, ProjectListQuery } from "@/lib/schemas/project";
import { listProjects, listWhere, orderFor } from "@/lib/server/data/projects";
import { db } from "@/lib/server/db";
import { closeDb } from "../../support/db";
import { sqlDuring } from "../../support/query-log";
import { makeOrganization, makeProject, type OrgFixture } from "../../support/fixtures";

let acme: OrgFixture;
let rival: OrgFixture;
const DAY_MS = 86_400_000;
const FIRSTS = ["Ada", "Bram", "Cleo", "Dov", "Esme", "Fitz"];
const LASTS = ["Marlowe", "Quist", "Ravel", "Sorrel", "Tamsin", "Underhill", "Vesper"];
const STREETS = ["Kiln Row", "Lantern Way", "Millrace Ct", "Nettle Ln"];
const CITIES = ["Ashby", "Brindle", "Corrow"];

/**
 * The list as it was read before: every visible project joined, counted distinct and sorted in one statement, on the
 * same conditions and order (what changed is how the page is read, not what it asks for).
 */
async function referenceList(viewer: Viewer, query: ProjectListQuery) {
  const { rows, count } = await Project.findAndCountAll({
    where: listWhere(viewer, query),
    include: [
      { model: Jurisdiction, as: "jurisdiction", attributes: ["id", "name", "necEdition"] },
      { model: Utility, as: "utility", attributes: ["id", "name"] },
      { model: User, as: "coordinator", attributes: ["id", "name"] },
      { model: User, as: "installer", attributes: ["id", "name"] },
      { model: Design, as: "design", attributes: ["reviewStatus"] },
    ],
    order: [orderFor(query), ["number", "DESC"]],
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
    distinct: true,
  });
  return {
    ids: rows.map((r) => r.id),
    names: rows.map((r) => r.customerName),
    jurisdictions: rows.map((r) => r.jurisdiction?.name ?? null),
    installers: rows.map((r) => r.installer?.name ?? null),
    nextActions: rows.map((r) => nextActionFor(r.stage as Stage, r.design?.reviewStatus ?? null, r.holdState ?? null)),
    total: count,
  };
}

beforeAll(async () => {
  acme = await makeOrganization("Scale");
  rival = await makeOrganization("Scale rival");
  // 60 projects across every stage, with repeated names and dates so ties fall to the project number,
  // some waiting and some not, some set aside, a few without authority, installer or design.
  for (let i = 0; i < 60; i++) {
    const stage: Stage = STAGES[(i * 7) % STAGES.length]!;
    const project = await makeProject(acme, {
      customerName: `${FIRSTS[i % FIRSTS.length]} ${LASTS[i % LASTS.length]}`,
      street: `${10 + i} ${STREETS[i % STREETS.length]}`,
      city: CITIES[i % CITIES.length]!,
      utilityAccountNumber: i % 9 === 0 ? null : `QA-${700_000 + i * 13}`,
      stage,
      stageChangedAt: new Date(Date.UTC(2026, 10, 1) - (i % 12) * DAY_MS),
      waitingOn: i % 3 === 0 ? null : i % 3 === 1 ? "ahj" : "utility",
      waitingSince: i % 3 === 0 ? null : new Date(Date.UTC(2026, 10, 2) - (i % 5) * DAY_MS),
      holdState: i % 11 === 0 ? "on_hold" : i % 13 === 0 ? "cancelled" : null,
      permitStatus: i % 4 === 0 ? "submitted" : null,
      jurisdictionId: i % 10 === 0 ? null : acme.jurisdiction.id,
      installerId: i % 2 ? acme.users.installer.id : null,
    });
    if (i % 5) {
      await Design.create({
        organizationId: acme.organization.id,
        projectId: project.id,
        draft: {},
        reviewStatus: i % 5 === 1 ? "pass" : "warn",
      });
    }
  }
  await makeProject(rival, { customerName: "Ada Marlowe", street: "10 Kiln Row" });
});

afterAll(async () => {
  await closeDb();
});

async function expectSameAsReference(viewer: Viewer, raw: Record<string, unknown>) {
  const query = ProjectListQuery.parse(raw);
  const page = await listProjects({ viewer, query });
  const reference = await referenceList(viewer, query);
  expect(
    page.items.map((p) => p.id),
    JSON.stringify(raw),
  ).toEqual(reference.ids);
  expect(page.items.map((p) => p.customerName)).toEqual(reference.names);
  expect(page.items.map((p) => p.jurisdiction?.name ?? null)).toEqual(reference.jurisdictions);
  expect(page.items.map((p) => p.installer?.name ?? null)).toEqual(reference.installers);
  expect(page.items.map((p) => p.nextAction)).toEqual(reference.nextActions);
  expect(page.total).toBe(reference.total);
}

describe("listProjects answers as the one-statement list did", () => {
  const sorts = PROJECT_SORTS.flatMap((sort) => (["asc", "desc"] as const).map((direction) => [sort, direction] as const));

  it.each(sorts)("sorted by %s %s, on every page", async (sort, direction) => {
    for (const page of [1, 2, 3, 4]) await expectSameAsReference(acme.viewers.coordinator, { sort, direction, page, pageSize: 17 });
  });

  it.each([
    ["a stage", { stage: "permit_filed" }],
    ["who it waits on", { waitingOn: "ahj" }],
    ["nobody holding it", { waitingOn: "nobody" }],
    ["set aside", { hold: "on_hold" }],
    ["active", { hold: "active" }],
    ["permit status", { permitStatus: "submitted" }],
    ["a name", { q: "marlowe" }],
    ["a street", { q: "lantern" }],
    ["a town", { q: "BRIND" }],
    ["an account number", { q: "qa-7001" }],
    ["a project number", { q: "1" }],
    ["nothing found", { q: "no such" }],
    ["a search and a filter, sorted", { q: "ravel", stage: "draft", sort: "customerName", direction: "asc" }],
    ["a page past the end", { page: 9, pageSize: 20 }],
  ])("filtered by %s", async (_what, raw) => {
    await expectSameAsReference(acme.viewers.coordinator, raw);
  });

  it("shows an installer only their own projects, in the same order and count", async () => {
    await expectSameAsReference(acme.viewers.installer, { sort: "city", direction: "asc", pageSize: 7, page: 2 });
  });

  it("reads the page's rows only, not the company's: three statements, none joining while it counts", async () => {
    const { sql } = await sqlDuring(() =>
      listProjects({ viewer: acme.viewers.coordinator, query: ProjectListQuery.parse({ pageSize: 5 }) }),
    );
    expect(sql).toHaveLength(3);
    const count = sql.find((s) => /count\(/i.test(s))!;
    expect(count).not.toMatch(/JOIN/);
    const joined = sql.filter((s) => /JOIN/.test(s));
    expect(joined).toHaveLength(1);
    // The joined read names its rows by id and is not limited or offset: the page was chosen already.
    expect(joined[0]).toMatch(/"Project"\."id" IN \(/);
    expect(joined[0]).not.toMatch(/LIMIT|OFFSET/);
  });
});

describe("searching the list uses the trigram indexes", () => {
  // A company of 12,000 projects, written in one statement, with a handful that match each search: on a
  // table this size the planner's own choice (no settings changed) shows whether the indexes serve.
  let bulk: OrgFixture;
  beforeAll(async () => {
    bulk = await makeOrganization("Bulk");
    await db().query(
      `insert into projects (id, organization_id, customer_name, street, city, state, postal_code, utility_account_number, stage,
                             stage_changed_at, created_at, updated_at)
       select gen_random_uuid(), :org,
              case when g % 1000 = 7 then 'Wynne Pelham-Grice' else 'Customer ' || md5(g::text) end,
              case when g % 1000 = 8 then '4 Sallowmere Close' else g || ' ' || md5((g * 3)::text) || ' St' end,
              case when g % 1000 = 9 then 'Thornabyvale' else 'Town ' || (g % 40) end, 'CO', '80000',
              case when g % 1000 = 10 then 'ZQ-55501' else 'AC-' || (100000 + g * 7) end,
              'draft', now(), now(), now()
         from generate_series(1, 12000) g`,
      { replacements: { org: bulk.organization.id } },
    );
    // As autovacuum would: GIN keeps fresh rows in a pending list the planner prices as read whole.
    await db().query("VACUUM ANALYZE projects");
  });

  async function plan(q: string): Promise<{ text: string; total: number }> {
    const { sql, result } = await sqlDuring(() =>
      listProjects({ viewer: bulk.viewers.coordinator, query: ProjectListQuery.parse({ q, pageSize: 5 }) }),
    );
    const count = sql
      .find((s) => /count\(/i.test(s))!
      .replace(/^Executing \(default\): /, "")
      .replace(/;$/, "");
    const rows = await db().query<{ "QUERY PLAN": string }>(`EXPLAIN ${count}`, { type: QueryTypes.SELECT });
    return { text: rows.map((r) => r["QUERY PLAN"]).join("\n"), total: result.total };
  }

  it.each([
    ["name", "pelham", "projects_customer_name_trigram"],
    ["address", "sallowmere", "projects_street_trigram"],
    ["town", "thornaby", "projects_city_trigram"],
    ["account number", "zq-555", "projects_utility_account_number_trigram"],
  ])("by %s", async (_what, q, index) => {
    const { text, total } = await plan(q);
    expect(total).toBe(12);
    expect(text).toContain(`Bitmap Index Scan on ${index}`);
    expect(text).not.toMatch(/Seq Scan on projects/);
  });

  it("the indexes exist on the pg_trgm operator class", async () => {
    const rows = await db().query<{ indexdef: string }>(
      "select indexdef from pg_indexes where tablename = 'projects' and indexname like 'projects_%_trigram' order by indexname",
      { type: QueryTypes.SELECT },
    );
    expect(rows.map((r) => r.indexdef)).toEqual([
      expect.stringMatching(/USING gin \(city gin_trgm_ops\)/),
      expect.stringMatching(/USING gin \(customer_name gin_trgm_ops\)/),
      expect.stringMatching(/USING gin \(street gin_trgm_ops\)/),
      expect.stringMatching(/USING gin \(utility_account_number gin_trgm_ops\)/),
    ]);
  });
});
