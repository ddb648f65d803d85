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
    const [tables] = await db().query(`select table_name from information_schema.tables where table_schema = 'public' and table_name <> 'schema_migrations'`);
    expect(tables).toEqual([]);
    await migrator.up();
    expect((await migrator.executed()).map((m) => m.name)).toEqual(applied);
  });
});
