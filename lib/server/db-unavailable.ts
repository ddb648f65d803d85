import "server-only";
import { ConnectionError, DatabaseError } from "sequelize";

// PostgreSQL's SQLSTATE classes for a connection that is gone or refused: 08 (connection exception)
// and 57P01–57P03 (the server is shutting down or starting up), from the PostgreSQL manual,
// Appendix A "PostgreSQL Error Codes".
const UNAVAILABLE_CODES = /^(08\d{3}|57P0[123])$/;

/** True when an error means the database cannot be reached right now, rather than that the request was wrong. */
export function isDatabaseUnavailable(error: unknown): boolean {
  if (error instanceof ConnectionError) return true;
  const parent = (error as { parent?: { code?: string; message?: string } } | null)?.parent;
  if (error instanceof DatabaseError && parent) {
    return (
      UNAVAILABLE_CODES.test(parent.code ?? "") ||
      /Connection terminated|ECONNREFUSED|ECONNRESET|the database system is (starting up|shutting down)/i.test(parent.message ?? "")
    );
  }
  return false;
}

export const DATABASE_UNAVAILABLE_MESSAGE = "The database is not answering just now. Nothing was saved; try again in a minute.";
