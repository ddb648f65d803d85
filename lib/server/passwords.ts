import "server-only";
import bcrypt from "bcryptjs";

const COST = 11;
let dummyHash: string | undefined;

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, COST);
}

export async function verifyPassword(password: string, hash: string | null): Promise<boolean> {
  // Compare against a dummy hash when there is none, so unknown accounts take as long as known ones.
  dummyHash ??= await bcrypt.hash("no account has this password", COST);
  const ok = await bcrypt.compare(password, hash ?? dummyHash);
  return ok && hash !== null;
}
