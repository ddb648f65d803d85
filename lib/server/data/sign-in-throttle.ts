import "server-only";
import { Op } from "sequelize";
import { SignInAttempt } from "@/models";
import { AppError } from "@/lib/errors";
import { db } from "../db";

export const THROTTLE = {
  windowMinutes: 15,
  maxFailuresPerAccount: 5,
  maxFailuresPerAddress: 20,
};

const accountKey = (email: string) => `account:${email.toLowerCase()}`;
const addressKey = (address: string) => `address:${address}`;

async function failuresSince(key: string, since: Date) {
  return SignInAttempt.count({ where: { key, createdAt: { [Op.gte]: since } } });
}

/** Throws LIMIT_EXCEEDED when the account or the client address failed too often lately. */
export async function assertSignInAllowed({ email, address }: { email: string; address: string }) {
  db();
  const since = new Date(Date.now() - THROTTLE.windowMinutes * 60_000);
  const [byAccount, byAddress] = await Promise.all([failuresSince(accountKey(email), since), failuresSince(addressKey(address), since)]);
  if (byAccount >= THROTTLE.maxFailuresPerAccount) {
    throw new AppError("LIMIT_EXCEEDED", `Too many failed sign-ins for this account. Wait ${THROTTLE.windowMinutes} minutes and try again.`);
  }
  if (byAddress >= THROTTLE.maxFailuresPerAddress) {
    throw new AppError("LIMIT_EXCEEDED", `Too many failed sign-ins from this network. Wait ${THROTTLE.windowMinutes} minutes and try again.`);
  }
}

export async function recordSignInFailure({ email, address }: { email: string; address: string }) {
  db();
  await SignInAttempt.bulkCreate([{ key: accountKey(email) }, { key: addressKey(address) }]);
}

/** A success clears the account's count; the address count stays, so one good account cannot launder guessing. */
export async function clearAccountFailures(email: string) {
  db();
  await SignInAttempt.destroy({ where: { key: accountKey(email) } });
}
