import { describe, expect, it } from "vitest";
import { parseEnv } from "@/lib/config/env-schema";

const good = {
  DATABASE_URL: "postgres://app@127.0.0.1:5432/ohmstead",
  APP_URL: "https://permits.example.com",
  NEXTAUTH_SECRET: "x".repeat(32),
  S3_BUCKET: "packets",
  S3_ACCESS_KEY_ID: "key",
  S3_SECRET_ACCESS_KEY: "secret",
  SMTP_URL: "smtp://relay.example.com:587",
  MAIL_FROM: "Ohmstead <no-reply@example.com>",
};

describe("parseEnv", () => {
  it("accepts a production configuration without the local fakes", () => {
    const env = parseEnv(good);
    expect(env.S3_ENDPOINT).toBeUndefined();
    expect(env.MAILBOX_URL).toBeUndefined();
    expect(env.S3_FORCE_PATH_STYLE).toBe(false);
  });

  it("names each missing or malformed variable", () => {
    const { DATABASE_URL: _missing, ...rest } = good;
    const attempt = () => parseEnv({ ...rest, SMTP_URL: "relay.example.com", NEXTAUTH_SECRET: "short" });
    expect(attempt).toThrow(/DATABASE_URL: DATABASE_URL is required/);
    expect(attempt).toThrow(/SMTP_URL/);
    expect(attempt).toThrow(/NEXTAUTH_SECRET: NEXTAUTH_SECRET must be at least 32 characters/);
  });

  it("refuses a database URL of another kind", () => {
    expect(() => parseEnv({ ...good, DATABASE_URL: "mysql://localhost/db" })).toThrow(/postgres/);
  });
});
