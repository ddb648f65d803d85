// The background worker: takes packet generations from the PostgreSQL-backed
// queue. Run beside the app (npm start and npm test start one); in production
// run as many as needed with `npm run worker`.
import PgBoss from "pg-boss";
import { PACKET_QUEUE, type PacketJob } from "@/lib/server/services/jobs";
import { generatePacket } from "@/lib/server/services/packet-generation";

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

let stopping = false;
for (const signal of ["SIGINT", "SIGTERM"] as const) {
  process.on(signal, async () => {
    if (stopping) return;
    stopping = true;
    await boss.stop({ graceful: true, timeout: 15_000 });
    process.exit(0);
  });
}
