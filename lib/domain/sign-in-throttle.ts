// When a sign-in may be tried, decided from recent failures. Pure, so the rule is tested on its own.
//
// Guessing is slowed, never turned into a lock that someone else can set off (OWASP Authentication
// Cheat Sheet, "Protect Against Automated Attacks": lockouts let an attacker deny service; prefer
// growing delays, and lock per account *and* source where locking at all):
//  - one address that fails on one account waits a growing pause after a few free tries;
//  - one address that fails on many accounts waits until its failures fall out of the window;
//  - many addresses failing on one account (distributed guessing) slow down only addresses that
//    have never signed in to it; the account's owner, from an address they have used, is not held.

export const SIGN_IN_THROTTLE = {
  windowMinutes: 15,
  /** Free wrong passwords for one account from one address before pauses begin. */
  freePairFailures: 5,
  /** Failures on one account from every address at which unknown addresses are paused too. */
  accountAlarmFailures: 20,
  /** Failures from one address across every account before it must wait out the window. */
  maxAddressFailures: 20,
  firstPauseSeconds: 2,
  maxPauseSeconds: 60,
} as const;

export type RecentFailures = {
  /** Failures on this account from this address in the window, and the newest one. */
  pair: { count: number; latestAt: Date | null };
  /** Failures on this account from every address in the window, and the newest one. */
  account: { count: number; latestAt: Date | null };
  /** Failures from this address on any account in the window, oldest first (at most maxAddressFailures). */
  address: { count: number; oldestCountedAt: Date | null };
  /** This address has signed in to this account before. */
  knownAddress: boolean;
};

export type SignInDecision = { allowed: true } | { allowed: false; waitSeconds: number; reason: "pair" | "account" | "address" };

/** 2, 4, 8 … seconds for each failure past the free ones, never more than the cap. */
export function pauseSeconds(failures: number, free: number): number {
  if (failures < free) return 0;
  const { firstPauseSeconds, maxPauseSeconds } = SIGN_IN_THROTTLE;
  return Math.min(maxPauseSeconds, firstPauseSeconds * 2 ** Math.min(failures - free, 10));
}

function remaining(latestAt: Date | null, seconds: number, now: Date): number {
  if (!latestAt || seconds === 0) return 0;
  return Math.max(0, Math.ceil((latestAt.getTime() + seconds * 1000 - now.getTime()) / 1000));
}

/** Whether an attempt may be checked now, and if not, how long to wait and why. */
export function decideSignIn(recent: RecentFailures, now: Date): SignInDecision {
  const t = SIGN_IN_THROTTLE;
  if (recent.address.count >= t.maxAddressFailures && recent.address.oldestCountedAt) {
    const waitSeconds = remaining(recent.address.oldestCountedAt, t.windowMinutes * 60, now);
    if (waitSeconds > 0) return { allowed: false, waitSeconds, reason: "address" };
  }
  const pairWait = remaining(recent.pair.latestAt, pauseSeconds(recent.pair.count, t.freePairFailures), now);
  if (pairWait > 0) return { allowed: false, waitSeconds: pairWait, reason: "pair" };
  if (!recent.knownAddress) {
    const accountWait = remaining(recent.account.latestAt, pauseSeconds(recent.account.count, t.accountAlarmFailures), now);
    if (accountWait > 0) return { allowed: false, waitSeconds: accountWait, reason: "account" };
  }
  return { allowed: true };
}

const wait = (seconds: number) => (seconds < 90 ? `${seconds} second${seconds === 1 ? "" : "s"}` : `${Math.ceil(seconds / 60)} minutes`);

/** What the person signing in reads; it says that nothing is locked, only slowed. */
export function throttleMessage(decision: Extract<SignInDecision, { allowed: false }>): string {
  switch (decision.reason) {
    case "pair":
      return `Several wrong passwords were entered for this account from here, so each new try waits a little longer. Try again in ${wait(decision.waitSeconds)}. The account is not locked.`;
    case "account":
      return `This account has had many wrong passwords from different places in the last few minutes, so sign-ins from new places are slowed down. Try again in ${wait(decision.waitSeconds)}, or from a device you have signed in with before.`;
    case "address":
      return `Too many failed sign-ins came from your network in the last ${SIGN_IN_THROTTLE.windowMinutes} minutes. Try again in ${wait(decision.waitSeconds)}.`;
  }
}
