// Starts the local services one profile needs and returns the environment
// the app and the scripts read. `dev` keeps its data between runs; `test`
// uses its own ports and folders so both can run side by side.
import { randomBytes } from "node:crypto";
import { existsSync, mkdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import path from "node:path";
import { databaseUrl, ensureDatabase, startPostgres } from "./postgres.mjs";
import { startMailCatcher } from "./mail-catcher.mjs";
import { FAKE_ACCESS_KEY_ID, FAKE_SECRET_ACCESS_KEY, startStorageFake } from "../../storage-fake/server.mjs";
import { FAKE_STRIPE_SECRET_KEY, FAKE_STRIPE_WEBHOOK_SECRET, startPaymentsFake } from "../../payments-fake/server.mjs";

export const PROFILES = {
  dev: { app: 3000, postgres: 54329, storage: 4569, payments: 4589, smtp: 2525, mailbox: 2526, database: "ohmstead" },
  test: { app: 3100, postgres: 54339, storage: 4579, payments: 4599, smtp: 2535, mailbox: 2536, database: "ohmstead_e2e" },
  // Several app servers and workers against one database and storage (tests/system, npm run bench:load); app servers take app, app + 1, …
  system: { app: 3200, postgres: 54359, storage: 4609, payments: 4619, smtp: 2545, mailbox: 2546, database: "ohmstead_system" },
  // A company of thousands of projects for the benchmarks (npm run seed:scale, bench:api, bench:web); never the dev or test data.
  scale: { app: 3300, postgres: 54369, storage: 4629, payments: 4639, smtp: 2555, mailbox: 2556, database: "ohmstead_scale" },
};

/** A local-only session secret kept in the git-ignored data folder. */
function localSecret(dataRoot) {
  const file = path.join(dataRoot, "auth-secret");
  if (!existsSync(file)) writeFileSync(file, randomBytes(32).toString("base64url"), { mode: 0o600 });
  return readFileSync(file, "utf8").trim();
}

/**
 * OHMSTEAD_PORT_OFFSET shifts every port and gets its own data folder, so two
 * checkouts or two people can run the same profile on one machine.
 */
function profileFor(profile) {
  const offset = Number(process.env.OHMSTEAD_PORT_OFFSET ?? 0);
  const base = PROFILES[profile];
  if (!offset) return { ports: base, folder: profile };
  const shifted = Object.fromEntries(Object.entries(base).map(([k, v]) => [k, typeof v === "number" ? v + offset : v]));
  return { ports: shifted, folder: `${profile}-${offset}` };
}

export async function startStack({ root, profile, postgresBin, fresh = false }) {
  const { ports, folder } = profileFor(profile);
  const dataRoot = path.join(root, ".data", folder);
  if (fresh) {
    rmSync(path.join(dataRoot, "storage"), { recursive: true, force: true });
    rmSync(path.join(dataRoot, "mail"), { recursive: true, force: true });
    rmSync(path.join(dataRoot, "payments"), { recursive: true, force: true });
  }
  mkdirSync(dataRoot, { recursive: true });

  const stops = [];
  const stopAll = async () => {
    for (const stop of stops.reverse()) {
      try {
        await stop();
      } catch (error) {
        console.error("stop failed:", error?.message ?? error);
      }
    }
  };
  try {
    const postgresOptions = { bin: postgresBin, dataDir: path.join(dataRoot, "postgres"), port: ports.postgres };
    let postgres = await startPostgres(postgresOptions);
    stops.push(() => postgres.stop());
    await ensureDatabase(ports.postgres, ports.database);

    const bucket = "ohmstead-files";
    const storageOptions = { port: ports.storage, directory: path.join(dataRoot, "storage"), bucket };
    let storage = await startStorageFake(storageOptions);
    stops.push(() => storage?.stop());

    const appUrl = `http://127.0.0.1:${ports.app}`;
    // Webhooks go to the app as Stripe would send them; until the app is up the fake retries, then resends after a restart.
    const payments = await startPaymentsFake({
      port: ports.payments,
      directory: path.join(dataRoot, "payments"),
      webhookUrl: `${appUrl}/api/webhooks/stripe`,
    });
    stops.push(payments.stop);

    const mail = await startMailCatcher({ smtpPort: ports.smtp, httpPort: ports.mailbox, directory: path.join(dataRoot, "mail") });
    stops.push(mail.stop);

    const env = {
      NODE_ENV: "production",
      NEXT_TELEMETRY_DISABLED: "1",
      ...(process.env.NEXT_DIST_DIR ? { NEXT_DIST_DIR: process.env.NEXT_DIST_DIR } : {}),
      APP_URL: appUrl,
      NEXTAUTH_URL: appUrl,
      NEXTAUTH_SECRET: localSecret(dataRoot),
      DATABASE_URL: databaseUrl(ports.postgres, ports.database),
      S3_ENDPOINT: `http://127.0.0.1:${ports.storage}`,
      S3_REGION: "us-east-1",
      S3_BUCKET: bucket,
      S3_ACCESS_KEY_ID: FAKE_ACCESS_KEY_ID,
      S3_SECRET_ACCESS_KEY: FAKE_SECRET_ACCESS_KEY,
      S3_FORCE_PATH_STYLE: "true",
      SMTP_URL: `smtp://127.0.0.1:${ports.smtp}`,
      MAIL_FROM: "Ohmstead <no-reply@ohmstead.local>",
      MAILBOX_URL: `http://127.0.0.1:${ports.mailbox}`,
      // The local test-mode payments fake and its keys (not secrets); real keys work with STRIPE_API_URL unset.
      STRIPE_SECRET_KEY: FAKE_STRIPE_SECRET_KEY,
      STRIPE_WEBHOOK_SECRET: FAKE_STRIPE_WEBHOOK_SECRET,
      STRIPE_API_URL: payments.url,
    };
    // Fault tests stop and start the database and the storage under a running app.
    const services = {
      postgres: { stop: () => postgres.stop(), start: async () => void (postgres = await startPostgres(postgresOptions)) },
      storage: {
        stop: async () => {
          await storage?.stop();
          storage = null;
        },
        start: async () => void (storage = await startStorageFake(storageOptions)),
      },
    };
    return { ports, env, services, dataRoot, stop: stopAll };
  } catch (error) {
    await stopAll();
    throw error;
  }
}
