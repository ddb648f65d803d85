// Types for the plain-JavaScript payments fake, for TypeScript tests and scripts.

/** Local fake keys, not secrets. */
export declare const FAKE_STRIPE_SECRET_KEY: "sk_test_ohmstead_local_fake";
/** Local fake keys, not secrets. */
export declare const FAKE_STRIPE_WEBHOOK_SECRET: "whsec_ohmstead_local_fake";

/** Card numbers the fake understands (no spaces). */
export declare const FAKE_TEST_CARDS: {
  readonly succeeds: "4242424242424242";
  readonly declined: "4000000000000002";
  readonly authentication: "4000002500003155";
};

export interface PaymentsFakeOptions {
  /** 0 picks a free port; the returned url carries the real one. */
  port: number;
  /** Folder for state.json; without it the state lives in memory only. */
  directory?: string;
  /** Defaults to FAKE_STRIPE_SECRET_KEY. */
  apiKey?: string;
  /** Where events are POSTed; unset keeps events without delivering them. */
  webhookUrl?: string | null;
  /** Defaults to FAKE_STRIPE_WEBHOOK_SECRET. */
  webhookSecret?: string;
  /** Pauses between delivery tries; one more try than entries. Defaults to 0.5 s, 1 s, 2 s, 4 s, 8 s, 8 s, 8 s. */
  webhookRetryDelaysMs?: number[];
}

export interface PaymentsFake {
  /** e.g. http://127.0.0.1:41234 */
  url: string;
  stop(): Promise<void>;
}

export declare function startPaymentsFake(options: PaymentsFakeOptions): Promise<PaymentsFake>;
