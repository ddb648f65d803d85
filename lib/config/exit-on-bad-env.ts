import { parseEnv } from "./env-schema";

/** Stops a starting server whose configuration is incomplete, naming each bad variable. */
export function exitOnBadEnv() {
  try {
    parseEnv(process.env);
  } catch (error) {
    console.error(
      `\n${error instanceof Error ? error.message : String(error)}\nSet these variables (see README.md, "Configuration") and start again.\n`,
    );
    process.exit(1);
  }
}

/**
 * Stops a server started without scripts/serve.mjs (plain `next start`): only that script decides each
 * client's address from the connection, and throttles and access logs would otherwise believe the
 * X-Forwarded-For a client writes.
 */
export function exitOutsideFrontDoor() {
  if (process.env.OHMSTEAD_FRONT_DOOR === "1") return;
  console.error(
    '\nStart Ohmstead with `npm run serve` (scripts/serve.mjs), not `next start`: it takes each client\'s address from the connection or from TRUSTED_PROXY_HOPS proxies (see README.md, "Configuration for production").\n',
  );
  process.exit(1);
}
