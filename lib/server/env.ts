import "server-only";
import { parseEnv, type Env } from "@/lib/config/env-schema";

let cached: Env | undefined;

/** The validated configuration; read nowhere else. */
export function env(): Env {
  cached ??= parseEnv(process.env);
  return cached;
}
