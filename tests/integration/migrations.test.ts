import { randomUUID } from "node:crypto";
import { afterAll, describe, expect, it } from "vitest";
import { createMigrator } from "@/lib/db/migrator";
import { db } from "@/lib/server/db";
import { closeDb } from "./support/db";

afterAll(async () => {
  await closeDb();
});

describe("migrations", () => {
  it("run down to nothing and up again", async () => {
    const migrator = createMigrator(db());
    const applied = (await migrator.executed()).map((m) => m.name);
    expect(applied.length).toBeGreaterThan(0);
    await migrator.down({ to: 0 });
    const [tables] = await db().query(
      `select table_name from information_schema.tables where table_schema = 'public' and table_name <> 'schema_migrations'`,
    );
    expect(tables).toEqual([]);
    await migrator.up();
    expect((await migrator.executed()).map((m) => m.name)).toEqual(applied);
  });

  it("a utility's one required grid profile becomes its accepted list, and the first accepted one comes back down", async () => {
    const migrator = createMigrator(db());
    const profiles = "20261203000100-utility-accepted-grid-profiles.ts";
    await migrator.down({ to: profiles });
    const organizationId = randomUUID();
    await db().query(
      `insert into organizations (id, name, created_at, updated_at) values ('${organizationId}', 'Profile migration', now(), now())`,
    );
    const insert = (name: string, profile: string) =>
      db().query(
        `insert into utilities (id, organization_id, name, service_voltages, required_grid_profile, notes, created_at, updated_at) values ('${randomUUID()}', '${organizationId}', '${name}', '{}', '${profile}', '', now(), now())`,
      );
    await insert("Fenmoor", "IEEE 1547-2018 Category B");
    await insert("Blankwater", " ");
    await migrator.up();
    const read = async (column: string) =>
      (await db().query(`select name, ${column} as v from utilities where organization_id = '${organizationId}' order by name`))[0];
    expect(await read("accepted_grid_profiles")).toEqual([
      { name: "Blankwater", v: [] },
      { name: "Fenmoor", v: ["IEEE 1547-2018 Category B"] },
    ]);
    await db().query(
      `update utilities set accepted_grid_profiles = '{"Rule 21","IEEE 1547-2018 Category B"}' where name = 'Fenmoor' and organization_id = '${organizationId}'`,
    );
    await migrator.down({ to: profiles });
    expect(await read("required_grid_profile")).toEqual([
      { name: "Blankwater", v: "" },
      { name: "Fenmoor", v: "Rule 21" },
    ]);
    await migrator.up();
  });
});
