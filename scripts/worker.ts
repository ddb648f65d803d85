// The background worker: takes packet generations from the PostgreSQL-backed
// queue, sends the e-mail outbox, issues payment receipts and reconciles checkouts. Run beside the app (npm start and npm test start one); in production
// run as many as needed with `npm run worker`.
import PgBoss from "pg-boss";
import { PACKET_QUEUE, type PacketJob } from "@/lib/server/services/jobs";
import { deliverDueMail } from "@/lib/server/services/outbox";
import { generatePacket } from "@/lib/server/services/packet-generation";
import { failAbandonedPackets } from "@/lib/server/data/packets";
import { reconcilePendingPayments } from "@/lib/server/data/payments";
import { issueDueReceipts } from "@/lib/server/services/receipts";

const url = process.env.DATABASE_URL;
if (!url) {
  console.error("DATABASE_URL is not set.");
  process.exit(1);
}

const boss = new PgBoss({ connectionString: url });
boss.on("error", (error) => console.error("worker queue error", error));
await boss.start();
await boss.createQueue(PACKET_QUEUE);
await boss.work<PacketJob>(PACKET_QUEUE, { pollingIntervalSeconds: 0.5, batchSize: 1 }, async ([job]) => {
  await generatePacket(job.data.packetId);
});
console.log("• Packet worker is taking jobs.");

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
// packet generations a worker abandoned marked failed so they can be retried.
const RECEIPT_INTERVAL_MS = 2_000;
const RECONCILE_EVERY = 15; // receipt rounds, about 30 s
let paymentRound: Promise<void> = Promise.resolve();
let rounds = 0;
async function paymentsLoop() {
  if (stopping) return;
  const reconcile = rounds++ % RECONCILE_EVERY === 0 && Boolean(process.env.STRIPE_SECRET_KEY);
  paymentRound = (async () => {
    if (reconcile) await reconcilePendingPayments({ olderThanMs: 60_000 }).catch((error) => console.error("payment reconciliation error", error));
    if (rounds % RECONCILE_EVERY === 1) await failAbandonedPackets().catch((error) => console.error("packet maintenance error", error));
    await issueDueReceipts().catch((error) => console.error("receipt error", error));
  })();
  await paymentRound;
  if (!stopping) setTimeout(paymentsLoop, RECEIPT_INTERVAL_MS);
}
void paymentsLoop();
console.log("• Payments worker is issuing receipts and reconciling checkouts.");

for (const signal of ["SIGINT", "SIGTERM"] as const) {
  process.on(signal, async () => {
    if (stopping) return;
    stopping = true;
    await mailRound; // let a message in flight be marked, so it is not sent again
    await paymentRound;
    await boss.stop({ graceful: true, timeout: 15_000 });
    process.exit(0);
  });
}
