// Grows the demo scenario's first company to `--projects N` projects for the benchmarks (run by
// scripts/bench/seed-scale.mjs on the scale profile, after the demo seed). The demo projects first get
// what the demo seed leaves to people (ready packets and paid fees, linked from their filings); then
// each is copied, with every row hanging off it, by INSERT … SELECT in the database: thousands of rows a
// statement, never one request per row. Copies get their own names, addresses, account numbers and dates.
import pg from "pg";
import { STAGES, type Stage } from "@/lib/domain/stages";
import { computeFees, feeNameKey, type FeeLine } from "@/lib/fees";
import { ORGANIZATIONS, CUSTOMERS, STREETS } from "@/lib/seed/demo-scenario";
import { packetFixture } from "@/tests/support/packet-fixture";

const args = process.argv.slice(2);
const target = Number(args[args.indexOf("--projects") + 1]);
const client = new pg.Client({ connectionString: process.env.DATABASE_URL });

/**
 * The rows that hang off a project, parents before children, with the column that ties each to the
 * table it is copied along with. Columns that must stay unique get the copy's number appended.
 */
const CHILDREN: { table: string; parent: string; via: string; unique?: string[] }[] = [
  { table: "designs", parent: "projects", via: "project_id" },
  { table: "stage_changes", parent: "projects", via: "project_id" },
  { table: "commissioning_records", parent: "projects", via: "project_id" },
  { table: "project_files", parent: "projects", via: "project_id", unique: ["object_key"] },
  { table: "packets", parent: "projects", via: "project_id" },
  { table: "payments", parent: "projects", via: "project_id", unique: ["checkout_session_id", "payment_intent_id", "receipt_number"] },
  { table: "payment_lines", parent: "payments", via: "payment_id" },
  { table: "filings", parent: "projects", via: "project_id" },
  { table: "correction_rounds", parent: "filings", via: "filing_id" },
  { table: "inspections", parent: "filings", via: "filing_id" },
  { table: "filing_items", parent: "correction_rounds", via: "round_id" },
  { table: "filing_items", parent: "inspections", via: "inspection_id" },
];

type Column = { name: string; type: string };

async function columnsOf(table: string): Promise<Column[]> {
  const { rows } = await client.query<{ column_name: string; data_type: string }>(
    "select column_name, data_type from information_schema.columns where table_schema = 'public' and table_name = $1 order by ordinal_position",
    [table],
  );
  return rows.map((r) => ({ name: r.column_name, type: r.data_type }));
}

/** Foreign keys of `table` to tables being copied: column → referenced table. */
async function copiedReferences(table: string, copied: Set<string>): Promise<Map<string, string>> {
  const { rows } = await client.query<{ col: string; parent: string }>(
    `select a.attname as col, cf.relname as parent from pg_constraint k
       join pg_class c on c.oid = k.conrelid join pg_class cf on cf.oid = k.confrelid
       join pg_attribute a on a.attrelid = k.conrelid and a.attnum = k.conkey[1]
      where k.contype = 'f' and c.relname = $1`,
    [table],
  );
  return new Map(rows.filter((r) => copied.has(r.parent)).map((r) => [r.col, r.parent]));
}

/** Copies the rows of `table` whose `via` column points at a copied parent; fills map_<table> (copy, old_id, new_id). */
async function copyChildren({ table, parent, via, unique = [] }: (typeof CHILDREN)[number], copied: Set<string>) {
  await client.query(`create temp table if not exists map_${table} (copy int, old_id uuid, new_id uuid)`);
  await client.query(
    `insert into map_${table} select m.copy, t.id, gen_random_uuid() from ${table} t join map_${parent} m on m.old_id = t.${via}`,
  );
  copied.add(table);
  const references = await copiedReferences(table, copied);
  const joins: string[] = [];
  const values = (await columnsOf(table)).map(({ name, type }) => {
    if (name === "id") return "me.new_id";
    const referenced = references.get(name);
    if (referenced) {
      const alias = `r_${name}`;
      joins.push(`left join map_${referenced} ${alias} on ${alias}.old_id = t.${name} and ${alias}.copy = me.copy`);
      return `${alias}.new_id`;
    }
    if (unique.includes(name)) return `t.${name} || '-c' || me.copy`;
    // Each copy's life runs up to two months earlier than the original's.
    if (type.startsWith("timestamp")) return `t.${name} + shift.days * interval '1 day'`;
    if (type === "date") return `t.${name} + shift.days`;
    return `t.${name}`;
  });
  const columns = (await columnsOf(table)).map((c) => `"${c.name}"`).join(", ");
  await client.query(
    `insert into ${table} (${columns})
     select ${values.join(", ")} from ${table} t
       join map_${table} me on me.old_id = t.id and me.copy > 0
       join copy_shift shift on shift.copy = me.copy
       ${joins.join("\n")}
      where t.${via} is not null`,
  );
}

const DAY = "interval '1 day'";

/** Ready packets and paid fees for the demo projects that have filed (the demo seed leaves them to people). */
async function givePacketsAndPayments(organizationId: string) {
  const { rows: projects } = await client.query(
    `select p.id, p.number, p.stage, p.created_at, p.declared_valuation_cents, p.customer_name, p.street, p.city, p.postal_code,
            p.utility_account_number, p.meter_number, p.coordinator_id, p.jurisdiction_id, p.utility_id
       from projects p where p.organization_id = $1 order by p.number`,
    [organizationId],
  );
  const { rows: schedules } = await client.query(
    "select authority_kind, authority_id, lines from fee_schedules where organization_id = $1",
    [organizationId],
  );
  const { rows: authorities } = await client.query(
    "select id, name from jurisdictions where organization_id = $1 union all select id, name from utilities where organization_id = $1",
    [organizationId],
  );
  const authorityName = new Map(authorities.map((a) => [a.id, a.name as string]));
  let receipt = 0;
  for (const [i, p] of projects.entries()) {
    const stageAt = STAGES.indexOf(p.stage as Stage);
    for (const kind of ["permit", "interconnection"] as const) {
      if (stageAt < STAGES.indexOf(kind === "permit" ? "permit_filed" : "utility_filed")) continue;
      const authorityId = kind === "permit" ? p.jurisdiction_id : p.utility_id;
      // One packet in four went out again after corrections.
      const revisions = i % 4 === 0 ? 2 : 1;
      let packetId = "";
      for (let revision = 1; revision <= revisions; revision++) {
        const base = packetFixture({ kind, variant: i % 2, revision });
        const input = {
          ...base,
          project: {
            ...base.project,
            number: p.number,
            customerName: p.customer_name,
            street: p.street,
            city: p.city,
            postalCode: p.postal_code,
            utilityAccountNumber: p.utility_account_number,
            meterNumber: p.meter_number,
          },
        };
        const { rows } = await client.query(
          `insert into packets (id, organization_id, project_id, kind, revision, status, progress, step, input, changes, object_key,
                                sha256, size_bytes, page_count, attempts, requested_by_id, ready_at, created_at, updated_at, steps)
           values (gen_random_uuid(), $1, $2, $3, $4::int, 'ready', 100, '', $5, '[]', $6, repeat('0', 64), 1400000, $7, 1, $8,
                   $9::timestamptz + make_interval(days => $4::int), $9::timestamptz + make_interval(days => $4::int), $9::timestamptz + make_interval(days => $4::int), '[]') returning id`,
          [
            organizationId,
            p.id,
            kind,
            revision,
            JSON.stringify(input),
            `packets/${p.id}/${kind}-rev${revision}.pdf`,
            kind === "permit" ? 11 : 5,
            p.coordinator_id,
            p.created_at,
          ],
        );
        packetId = rows[0].id;
      }
      const schedule = schedules.find(
        (s) => s.authority_kind === (kind === "permit" ? "jurisdiction" : "utility") && s.authority_id === authorityId,
      );
      const fees = computeFees({
        lines: (schedule?.lines ?? []) as FeeLine[],
        facts: {
          dcKw: 7.6,
          acKw: 7.6,
          valuationCents: p.declared_valuation_cents === null ? 2_400_000 : Number(p.declared_valuation_cents),
          asOf: "2026-06-01",
        },
      });
      let paymentId: string | null = null;
      if (fees.totalCents > 0) {
        receipt++;
        const { rows } = await client.query(
          `insert into payments (id, organization_id, project_id, status, amount_cents, refunded_cents, currency, checkout_session_id,
                                 payment_intent_id, card_brand, card_last4, receipt_number, paid_at, created_by_id, created_at, updated_at)
           values (gen_random_uuid(), $1, $2, 'paid', $3, 0, 'usd', $4, $5, 'visa', '4242', $6, $7::timestamptz + ${DAY},
                   $8, $7::timestamptz + ${DAY}, $7::timestamptz + ${DAY}) returning id`,
          [
            organizationId,
            p.id,
            fees.totalCents,
            `cs_scale_${receipt}`,
            `pi_scale_${receipt}`,
            `R-S${receipt}`,
            p.created_at,
            p.coordinator_id,
          ],
        );
        paymentId = rows[0].id;
        for (const line of fees.lines) {
          await client.query(
            `insert into payment_lines (id, payment_id, fee_key, authority, name, arithmetic, amount_cents)
             values (gen_random_uuid(), $1, $2, $3, $4, $5, $6)`,
            [
              paymentId,
              `${kind === "permit" ? "jurisdiction" : "utility"}:${authorityId}:${feeNameKey(line.name)}`,
              authorityName.get(authorityId) ?? "",
              line.name,
              JSON.stringify(line.arithmetic),
              line.amountCents,
            ],
          );
        }
      }
      await client.query("update filings set packet_id = $1, payment_id = $2 where project_id = $3 and kind = $4", [
        packetId,
        paymentId,
        p.id,
        kind,
      ]);
    }
  }
}

/** Copies every project of the organization (with its rows) until it has `target` projects. */
async function copyProjects(organizationId: string) {
  const { rows } = await client.query<{ n: number }>("select count(*)::int as n from projects where organization_id = $1", [
    organizationId,
  ]);
  const base = rows[0].n;
  const wanted = target - base;
  if (wanted <= 0) return;
  // map_projects: copy 0 is the original itself, so references to rows that are not copied stay as they are.
  await client.query("create temp table map_projects (copy int, old_id uuid, new_id uuid, n int)");
  await client.query(
    `insert into map_projects (copy, old_id, new_id, n)
     select g, p.id, gen_random_uuid(), row_number() over (order by g, p.number)
       from projects p cross join generate_series(1, $2::int) g where p.organization_id = $1
      order by g, p.number limit $3`,
    [organizationId, Math.ceil(wanted / base), wanted],
  );
  await client.query("create temp table copy_shift as select g as copy, -((g * 37) % 61) as days from generate_series(1, $1::int) g", [
    Math.ceil(wanted / base),
  ]);
  const firsts = CUSTOMERS.map((c) => c.split(" ")[0]);
  const lasts = CUSTOMERS.map((c) => c.split(" ").slice(1).join(" "));
  const columns = await columnsOf("projects");
  const values = columns.map(({ name, type }) => {
    switch (name) {
      case "id":
        return "m.new_id";
      case "number":
        return "nextval(pg_get_serial_sequence('projects', 'number'))";
      // Names, streets and account numbers differ from copy to copy, so a search finds a few, not thousands.
      case "customer_name":
        // 30 first names × 26 middle initials × 30 surnames, two in three of them joined to a second: as many
        // people as a real customer base, so a search by surname finds a handful, as it would there.
        return `($1::text[])[1 + (m.n * 7) % ${firsts.length}] || ' ' || chr(65 + (m.n / ${firsts.length}) % 26) || '. ' || ($2::text[])[1 + (m.n / ${firsts.length * 26}) % ${lasts.length}] || case when m.n % 3 = 0 then '' else '-' || ($2::text[])[1 + (m.n * 11) % ${lasts.length}] end`;
      case "customer_email":
        return `lower(($1::text[])[1 + (m.n * 7) % ${firsts.length}]) || m.n || '@mail.example'`;
      case "street":
        return `(100 + (m.n * 7919) % 9800) || ' ' || ($3::text[])[1 + m.n % ${STREETS.length}]`;
      case "utility_account_number":
        return `split_part(t.utility_account_number, '-', 1) || '-' || (5000000 + m.n * 7919)`;
      case "meter_number":
        return "'M' || (80000000 + m.n * 104729)";
      default:
        if (type.startsWith("timestamp")) return `t.${name} + shift.days * ${DAY}`;
        if (type === "date") return `t.${name} + shift.days`;
        return `t.${name}`;
    }
  });
  await client.query(
    `insert into projects (${columns.map((c) => `"${c.name}"`).join(", ")})
     select ${values.join(", ")} from projects t join map_projects m on m.old_id = t.id join copy_shift shift on shift.copy = m.copy
      order by m.n`,
    [firsts, lasts, STREETS],
  );
  const copied = new Set(["projects"]);
  for (const child of CHILDREN) {
    const started = Date.now();
    await copyChildren(child, copied);
    console.log(`  ${child.table} (by ${child.via}) copied in ${Date.now() - started} ms`);
  }
  // A copy's packets print its own project, not the original's.
  await client.query(
    `update packets k set input = jsonb_set(jsonb_set(jsonb_set(k.input, '{project,number}', to_jsonb(p.number)),
                                  '{project,customerName}', to_jsonb(p.customer_name)), '{project,street}', to_jsonb(p.street))
       from projects p where p.id = k.project_id and p.organization_id = $1`,
    [organizationId],
  );
}

await client.connect();
try {
  const { rows } = await client.query("select id from organizations where name = $1", [ORGANIZATIONS.main.name]);
  if (!rows[0]) throw new Error("The demo scenario is missing: run the demo seed first.");
  const organizationId: string = rows[0].id;
  await client.query("begin");
  await givePacketsAndPayments(organizationId);
  await copyProjects(organizationId);
  await client.query("commit");
  await client.query("vacuum analyze");
  const { rows: counts } = await client.query(
    `select (select count(*) from projects where organization_id = $1) as projects, (select count(*) from designs) as designs,
            (select count(*) from packets) as packets, (select count(*) from filings) as filings, (select count(*) from payments) as payments,
            (select count(*) from stage_changes) as stage_changes`,
    [organizationId],
  );
  console.log(
    "• Scale fill: " +
      Object.entries(counts[0])
        .map(([k, v]) => `${v} ${k.replace("_", " ")}`)
        .join(", "),
  );
} finally {
  await client.end();
}
