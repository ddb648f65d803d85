import "server-only";
import PgBoss from "pg-boss";
import { env } from "../env";

/** The queue of packet generations, worked by scripts/worker.ts. */
export const PACKET_QUEUE = "packet-generate";
export type PacketJob = { packetId: string };
/** The morning digest's run, scheduled by the worker with pg-boss's cron (every quarter hour; each run sends what is due). */
export const DESK_DIGEST_QUEUE = "desk-digest";
export const DESK_DIGEST_CRON = "*/15 * * * *";

let sender: Promise<PgBoss> | undefined;

/** A pg-boss client that only sends: maintenance and scheduling are the worker's. */
function jobs(): Promise<PgBoss> {
  sender ??= (async () => {
    const boss = new PgBoss({ connectionString: env().DATABASE_URL, supervise: false, schedule: false });
    boss.on("error", (error) => console.error("job queue error", error));
    await boss.start();
    await boss.createQueue(PACKET_QUEUE);
    return boss;
  })().catch((error) => {
    sender = undefined;
    throw error;
  });
  return sender;
}

export async function enqueuePacketJob(packetId: string): Promise<void> {
  const boss = await jobs();
  await boss.send(PACKET_QUEUE, { packetId } satisfies PacketJob, { retryLimit: 0, expireInSeconds: 600 });
}
