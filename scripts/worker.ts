// The background worker: takes packet generations and the morning digest from the PostgreSQL-backed
// queue, sends the e-mail outbox, issues payment receipts and reconciles checkouts. Run beside the app (npm start and npm test start one); in production
// run as many as needed with `npm run worker`.
import PgBoss from "pg-boss";
import { DESK_DIGEST_CRON, DESK_DIGEST_QUEUE, PACKET_QUEUE, type PacketJob } from "@/lib/server/services/jobs";
import { deliverDueMail } from "@/lib/server/jobs/deliver-mail";
import { generatePacket } from "@/lib/server/jobs/generate-packet";
import { failAbandonedPackets } from "@/lib/server/data/packets";
import { sweepStorageRemovals } from "@/lib/server/data/storage-removals";
import { reconcilePendingPayments } from "@/lib/server/use-cases/payments";
import { pruneSignInAttempts } from "@/lib/server/data/sign-in-throttle";
import { issueDueReceipts } from "@/lib/server/jobs/issue-receipts";
import { sendDueDeskDigests } from "@/lib/server/jobs/send-desk-digests";

const url = process.env.DATABASE_URL;
if (!url) {
  console.error("DATABASE_URL is not set.");
  process.exit(1);
}

/** The queue, started once the database answers: a worker started during an outage waits for it rather than exiting. */
async function startQueue(): Promise<PgBoss> {
  for (let attempt = 1; ; attempt++) {
    const boss = new PgBoss({ connectionString: url });
    boss.on("error", (error) => console.error("worker queue error", error));
    try {
      await boss.start();
      await boss.createQueue(PACKET_QUEUE);
      await boss.createQueue(DESK_DIGEST_QUEUE);
      return boss;
    } catch (error) {
      if (attempt === 1)
        console.error("• The database is not answering; the worker keeps trying.", error instanceof Error ? error.message : error);
      await boss.stop({ graceful: false }).catch(() => undefined);
      await new Promise((resolve) => setTimeout(resolve, Math.min(30_000, 1_000 * attempt)));
    }
  }
}

const boss = await startQueue();
await boss.work<PacketJob>(PACKET_QUEUE, { pollingIntervalSeconds: 0.5, batchSize: 1 }, async ([job]) => {
  await generatePacket(job.data.packetId);
});
console.log("• Packet worker is taking jobs.");

// The morning digest: pg-boss's cron puts one run in the queue per quarter hour whichever worker's clock
// fires (schedules are kept in the database), and a run sends only the digests not yet claimed for the day.
await boss.schedule(DESK_DIGEST_QUEUE, DESK_DIGEST_CRON, {}, { retryLimit: 1, expireInSeconds: 600 });
await boss.work(DESK_DIGEST_QUEUE, { pollingIntervalSeconds: 5, batchSize: 1 }, async () => {
  const { sent } = await sendDueDeskDigests();
  if (sent) console.log(`• Morning digest: ${sent} queued.`);
});
console.log("• Digest worker sends each coordinator's morning digest.");

// The outbox is polled rather than queued in pg-boss: a row committed with the change is the job,
// and a short cadence keeps mail within a couple of seconds of the change.
const MAIL_INTERVAL_MS = 1_500;
let stopping = false;
let mailRound: Promise<void> = Promise.resolve();
async function deliverMailLoop() {
  if (stopping) return;
  mailRound = deliverDueMail({ limit: 20 })
    .then(({ failed }) => {
      if (failed) console.error(`outbox: ${failed} message(s) gave up after their last retry`);
    })
    .catch((error) => console.error("outbox delivery error", error));
  await mailRound;
  if (!stopping) setTimeout(deliverMailLoop, MAIL_INTERVAL_MS);
}
void deliverMailLoop();
console.log("• Mail worker is sending the outbox.");

// Maintenance: receipts for newly paid payments, a look at the processor for checkouts whose
// webhook never came (a crash between charge and webhook), so no payment stays unrecorded, and
// packet generations a worker abandoned marked failed so they can be retried, sign-in failures
// old enough that no throttle counts them forgotten, and stored objects of removed uploads that
// storage did not take away at once removed again.
const RECEIPT_INTERVAL_MS = 2_000;
const SLOW_CHECKS_EVERY = 15; // rounds, about 30 s
let maintenanceRound: Promise<void> = Promise.resolve();
let rounds = 0;
const logged = (what: string) => (error: unknown) => console.error(`${what} error`, error);
async function maintenanceLoop() {
  if (stopping) return;
  const slowChecks = rounds++ % SLOW_CHECKS_EVERY === 0;
  maintenanceRound = (async () => {
    if (slowChecks) {
      if (process.env.STRIPE_SECRET_KEY) await reconcilePendingPayments({ olderThanMs: 60_000 }).catch(logged("payment reconciliation"));
      await failAbandonedPackets().catch(logged("packet maintenance"));
      await pruneSignInAttempts().catch(logged("sign-in attempt pruning"));
    }
    await issueDueReceipts().catch(logged("receipt"));
    await sweepStorageRemovals().catch(logged("storage removal"));
  })();
  await maintenanceRound;
  if (!stopping) setTimeout(maintenanceLoop, RECEIPT_INTERVAL_MS);
}
void maintenanceLoop();
console.log("• Maintenance: receipts, checkout reconciliation, abandoned packet generations, removed uploads' stored objects.");

for (const signal of ["SIGINT", "SIGTERM"] as const) {
  process.on(signal, async () => {
    if (stopping) return;
    stopping = true;
    await mailRound; // let a message in flight be marked, so it is not sent again
    await maintenanceRound;
    await boss.stop({ graceful: true, timeout: 15_000 });
    process.exit(0);
  });
}
