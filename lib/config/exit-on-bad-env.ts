import { parseEnv } from "./env-schema";

/** Stops a starting server whose configuration is incomplete, naming each bad variable. */
export function exitOnBadEnv() {
  try {
    parseEnv(process.env);
  } catch (error) {
    console.error(`\n${error instanceof Error ? error.message : String(error)}\nSet these variables (see README.md, "Configuration") and start again.\n`);
    process.exit(1);
  }
}
