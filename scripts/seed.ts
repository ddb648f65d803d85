// Seeds the invented demo scenario when the database is empty.
import { createSequelize } from "@/lib/db/connection";
import { attachDemoDatasheets } from "@/lib/seed/attach-demo-datasheets";
import { attachDemoSignedForms } from "@/lib/seed/attach-demo-signed-forms";
import { seedDemo } from "@/lib/seed/seed-demo";

const url = process.env.DATABASE_URL;
if (!url) {
  console.error("DATABASE_URL is not set.");
  process.exit(1);
}
const sequelize = createSequelize(url);
try {
  const seeded = await seedDemo(sequelize);
  // Files go to storage after the rows commit; a rerun fills in any that are missing.
  await attachDemoDatasheets();
  await attachDemoSignedForms();
  console.log(seeded ? "• Seeded the demo scenario." : "• Database already has data; demo seed skipped.");
} finally {
  await sequelize.close();
}
