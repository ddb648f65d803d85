import "server-only";
import { Op, QueryTypes, type Transaction } from "sequelize";
import { SignInAttempt } from "@/models";
import { decideSignIn, SIGN_IN_THROTTLE, type RecentFailures, type SignInDecision } from "@/lib/domain/sign-in-throttle";
import { db } from "../db";

// Kept in PostgreSQL so that every app server counts the same failures.
const accountKey = (email: string) => `account:${email.toLowerCase()}`;
const addressKey = (address: string) => `address:${address}`;
const pairKey = (email: string, address: string) => `pair:${email.toLowerCase()}|${address}`;
const knownKey = (email: string, address: string) => `known:${email.toLowerCase()}|${address}`;

/** How long an address stays "known" to an account after a successful sign-in from it. */
const KNOWN_DAYS = 90;

type Row = {
  pair_count: string;
  pair_latest: Date | null;
  account_count: string;
  account_latest: Date | null;
  address_count: string;
  address_oldest: Date | null;
  known: boolean;
};

async function recentFailures(email: string, address: string, now: Date, transaction: Transaction): Promise<RecentFailures> {
  const since = new Date(now.getTime() - SIGN_IN_THROTTLE.windowMinutes * 60_000);
  const knownSince = new Date(now.getTime() - KNOWN_DAYS * 86_400_000);
  const [row] = await db().query<Row>(
    `SELECT
       (SELECT count(*) FROM sign_in_attempts WHERE key = :pair AND created_at >= :since) AS pair_count,
       (SELECT max(created_at) FROM sign_in_attempts WHERE key = :pair AND created_at >= :since) AS pair_latest,
       (SELECT count(*) FROM sign_in_attempts WHERE key = :account AND created_at >= :since) AS account_count,
       (SELECT max(created_at) FROM sign_in_attempts WHERE key = :account AND created_at >= :since) AS account_latest,
       (SELECT count(*) FROM (SELECT 1 FROM sign_in_attempts WHERE key = :address AND created_at >= :since LIMIT :limit) a) AS address_count,
       (SELECT min(created_at) FROM (SELECT created_at FROM sign_in_attempts WHERE key = :address AND created_at >= :since ORDER BY created_at DESC LIMIT :limit) a) AS address_oldest,
       EXISTS (SELECT 1 FROM sign_in_attempts WHERE key = :known AND created_at >= :knownSince) AS known`,
    {
      type: QueryTypes.SELECT,
      transaction,
      replacements: {
        pair: pairKey(email, address),
        account: accountKey(email),
        address: addressKey(address),
        known: knownKey(email, address),
        since,
        knownSince,
        limit: SIGN_IN_THROTTLE.maxAddressFailures,
      },
    },
  );
  return {
    pair: { count: Number(row!.pair_count), latestAt: row!.pair_latest },
    account: { count: Number(row!.account_count), latestAt: row!.account_latest },
    address: { count: Number(row!.address_count), oldestCountedAt: row!.address_oldest },
    knownAddress: row!.known,
  };
}

/**
 * Runs one sign-in attempt under the throttle: attempts on one account are taken one at a time
 * (an advisory lock held for the transaction), so parallel guesses cannot slip past a pause.
 * `check` verifies the password and says whether it matched; a throttled attempt is not checked
 * and not counted. The transaction commits either way, so a failure is always recorded.
 */
export async function throttledSignIn<T>(
  { email, address }: { email: string; address: string },
  check: (transaction: Transaction) => Promise<{ matched: boolean; value: T }>,
): Promise<{ decision: SignInDecision; matched: boolean; value?: T }> {
  const sequelize = db();
  return sequelize.transaction(async (transaction) => {
    await sequelize.query("SELECT pg_advisory_xact_lock(hashtext(:key))", { replacements: { key: accountKey(email) }, transaction });
    const now = new Date();
    const decision = decideSignIn(await recentFailures(email, address, now, transaction), now);
    if (!decision.allowed) return { decision, matched: false };
    const { matched, value } = await check(transaction);
    if (matched) {
      await SignInAttempt.destroy({ where: { key: pairKey(email, address) }, transaction });
      await SignInAttempt.destroy({ where: { key: knownKey(email, address) }, transaction });
      await SignInAttempt.create({ key: knownKey(email, address) }, { transaction });
    } else {
      await SignInAttempt.bulkCreate([{ key: accountKey(email) }, { key: addressKey(address) }, { key: pairKey(email, address) }], {
        transaction,
      });
    }
    return { decision, matched, value };
  });
}

/** Forgets failures older than a day and known addresses older than their term; the worker's maintenance calls it. */
export async function pruneSignInAttempts(now = new Date()): Promise<number> {
  db();
  const failuresBefore = new Date(now.getTime() - 86_400_000);
  const knownBefore = new Date(now.getTime() - KNOWN_DAYS * 86_400_000);
  return SignInAttempt.destroy({
    where: {
      [Op.or]: [
        { key: { [Op.notLike]: "known:%" }, createdAt: { [Op.lt]: failuresBefore } },
        { key: { [Op.like]: "known:%" }, createdAt: { [Op.lt]: knownBefore } },
      ],
    },
  });
}
