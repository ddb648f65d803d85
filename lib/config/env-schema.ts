import { z } from "zod";

const url = (what: string) => z.string({ error: `${what} is required` }).url({ error: `${what} must be a URL` });

const EnvSchema = z.object({
  DATABASE_URL: url("DATABASE_URL").refine((v) => v.startsWith("postgres"), "DATABASE_URL must be a postgres:// URL"),
  APP_URL: url("APP_URL"),
  NEXTAUTH_SECRET: z.string({ error: "NEXTAUTH_SECRET is required" }).min(32, "NEXTAUTH_SECRET must be at least 32 characters"),
  S3_ENDPOINT: url("S3_ENDPOINT").optional(),
  S3_REGION: z.string().min(1).default("us-east-1"),
  S3_BUCKET: z.string({ error: "S3_BUCKET is required" }).min(3),
  S3_ACCESS_KEY_ID: z.string({ error: "S3_ACCESS_KEY_ID is required" }).min(1),
  S3_SECRET_ACCESS_KEY: z.string({ error: "S3_SECRET_ACCESS_KEY is required" }).min(1),
  S3_FORCE_PATH_STYLE: z
    .enum(["true", "false"])
    .default("false")
    .transform((v) => v === "true"),
  SMTP_URL: url("SMTP_URL").refine((v) => /^smtps?:\/\//.test(v), "SMTP_URL must start with smtp:// or smtps://"),
  MAIL_FROM: z.string({ error: "MAIL_FROM is required" }).min(3),
  // Set only when the local fakes run: it turns the mailbox page on.
  MAILBOX_URL: url("MAILBOX_URL").optional(),
  // Fees: a Stripe secret key and the webhook endpoint's signing secret (the local fake's are not secrets).
  // STRIPE_API_URL points the SDK at the local fake; leave it unset to talk to Stripe itself.
  STRIPE_SECRET_KEY: z
    .string()
    .regex(/^(sk|rk)_(test|live)_\w+$/, "STRIPE_SECRET_KEY must look like sk_test_…")
    .optional(),
  STRIPE_WEBHOOK_SECRET: z
    .string()
    .regex(/^whsec_\w+$/, "STRIPE_WEBHOOK_SECRET must look like whsec_…")
    .optional(),
  STRIPE_API_URL: url("STRIPE_API_URL").optional(),
});

export type Env = z.infer<typeof EnvSchema>;

/** Checks the configuration; the message names every missing or malformed variable. */
export function parseEnv(source: Record<string, string | undefined>): Env {
  const result = EnvSchema.safeParse(source);
  if (!result.success) {
    const lines = result.error.issues.map((issue) => `  ${issue.path.join(".")}: ${issue.message}`);
    throw new Error(`Invalid configuration:\n${lines.join("\n")}`);
  }
  return result.data;
}
