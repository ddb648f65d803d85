import "server-only";
import { db } from "../db";
import { verifyMail } from "./mail";
import { verifyStorage } from "./storage";

export type ServiceHealth = { status: "up" | "down"; latencyMs: number; error?: string };

async function probe(check: () => Promise<unknown>, timeoutMs = 3000): Promise<ServiceHealth> {
  const started = performance.now();
  try {
    await Promise.race([
      check(),
      new Promise((_, reject) => setTimeout(() => reject(new Error(`no answer within ${timeoutMs} ms`)), timeoutMs)),
    ]);
    return { status: "up", latencyMs: Math.round(performance.now() - started) };
  } catch (error) {
    return {
      status: "down",
      latencyMs: Math.round(performance.now() - started),
      error: error instanceof Error ? error.message : String(error),
    };
  }
}

/** Database, storage and mail, each probed for real. */
export async function checkHealth() {
  const [database, storage, mail] = await Promise.all([probe(() => db().query("select 1")), probe(verifyStorage), probe(verifyMail)]);
  const services = { database, storage, mail };
  const ok = Object.values(services).every((s) => s.status === "up");
  return { ok, services };
}
