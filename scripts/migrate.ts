// Applies (`up`) or reverts one (`down`) migration against DATABASE_URL.
import { createSequelize } from "@/lib/db/connection";
import { createMigrator } from "@/lib/db/migrator";

const direction = process.argv[2] ?? "up";
const url = process.env.DATABASE_URL;
if (!url) {
  console.error("DATABASE_URL is not set.");
  process.exit(1);
}
const sequelize = createSequelize(url);
const migrator = createMigrator(sequelize);
try {
  const done = direction === "down" ? await migrator.down() : await migrator.up();
  console.log(`• Migrations ${direction}: ${done.length ? done.map((m) => m.name).join(", ") : "nothing to do"}`);
} finally {
  await sequelize.close();
}
