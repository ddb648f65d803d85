import "server-only";
import { Op } from "sequelize";
import { ShareLinkMiss } from "@/models";
import { AppError } from "@/lib/errors";

/** Unknown tokens allowed per client address and window before every public token route answers 429 to it. */
export const TOKEN_GUESS_THROTTLE = { windowMinutes: 10, maxMisses: 30 };

const windowStart = () => new Date(Date.now() - TOKEN_GUESS_THROTTLE.windowMinutes * 60_000);

/**
 * Refuses an address that tried too many unknown tokens lately: inspector links and calendar feeds share
 * one count, so guessing at either slows both. Called before the token is looked up, so a guesser who
 * hits a good token while refused learns nothing.
 */
export async function refuseTokenGuesser(address: string, what: string): Promise<void> {
  const misses = await ShareLinkMiss.count({ where: { address: address.slice(0, 100), createdAt: { [Op.gte]: windowStart() } } });
  if (misses >= TOKEN_GUESS_THROTTLE.maxMisses)
    throw new AppError(
      "LIMIT_EXCEEDED",
      `Too many unknown ${what} were tried from your network. Wait ${TOKEN_GUESS_THROTTLE.windowMinutes} minutes and try again.`,
    );
}

/** Counts an unknown token against the address; misses older than the window are forgotten. */
export async function recordTokenMiss(address: string): Promise<void> {
  await ShareLinkMiss.create({ address: address.slice(0, 100) });
  await ShareLinkMiss.destroy({ where: { createdAt: { [Op.lt]: windowStart() } } });
}
