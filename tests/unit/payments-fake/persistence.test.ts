import { existsSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import path from "node:path";
import { afterEach, describe, expect, it } from "vitest";
import { FAKE_TEST_CARDS, startPaymentsFake, type PaymentsFake } from "../../../payments-fake/server.mjs";
import { clientFor, fakeEvents, payWith, permitFeeSession, setWebhooks, startReceiver, tempDirectory, type Receiver } from "./support";

const cleanups: (() => Promise<void> | void)[] = [];
afterEach(async () => {
  for (const cleanup of cleanups.splice(0).reverse()) await cleanup();
});

async function start(directory: string, webhookUrl: string | null = null): Promise<PaymentsFake> {
  const fake = await startPaymentsFake({ port: 0, directory, webhookUrl });
  cleanups.push(() => fake.stop());
  return fake;
}

describe("persistence", () => {
  it("keeps sessions, payments, refunds and events across a stop and start", async () => {
    const dir = tempDirectory();
    cleanups.push(dir.remove);
    const first = await start(dir.path);
    const stripe = clientFor(first.url);
    const open = await permitFeeSession(stripe);
    const paidSession = await permitFeeSession(stripe);
    const { body } = await payWith(first.url, paidSession.id, FAKE_TEST_CARDS.succeeds);
    const refund = await stripe.refunds.create({ payment_intent: body.payment_intent.id, amount: 1_000 });
    const eventsBefore = await fakeEvents(first.url);
    await first.stop();

    const file = path.join(dir.path, "state.json");
    expect(existsSync(file)).toBe(true);
    expect(() => JSON.parse(readFileSync(file, "utf8"))).not.toThrow();
    expect(readdirSync(dir.path).filter((name) => name.endsWith(".tmp"))).toEqual([]);

    const second = await start(dir.path);
    const again = clientFor(second.url);
    const reopened = await again.checkout.sessions.retrieve(open.id);
    expect(reopened).toMatchObject({ status: "open", amount_total: open.amount_total, metadata: open.metadata });
    // The page address follows the new port.
    expect(reopened.url).toBe(`${second.url}/pay/${open.id}`);
    expect(await again.checkout.sessions.retrieve(paidSession.id)).toMatchObject({ status: "complete", payment_status: "paid" });
    expect(await again.refunds.retrieve(refund.id)).toEqual(refund);
    expect(await again.paymentIntents.retrieve(body.payment_intent.id)).toMatchObject({ status: "succeeded" });
    expect((await fakeEvents(second.url)).map((e) => e.event.id)).toEqual(eventsBefore.map((e) => e.event.id));

    const page = await fetch(reopened.url!);
    expect(page.status).toBe(200);
  });

  it("delivers, after a restart, the events a paused run held back", async () => {
    const dir = tempDirectory();
    cleanups.push(dir.remove);
    const receiver: Receiver = await startReceiver();
    cleanups.push(() => receiver.close());

    const first = await start(dir.path, receiver.url);
    await setWebhooks(first.url, { paused: true });
    const session = await permitFeeSession(clientFor(first.url));
    await payWith(first.url, session.id, FAKE_TEST_CARDS.succeeds);
    await first.stop();
    expect(receiver.deliveries).toEqual([]);

    await start(dir.path, receiver.url);
    await receiver.waitFor(() => receiver.types().includes("checkout.session.completed"), "held events after restart");
    await receiver.waitFor(() => receiver.deliveries.length === 4, "all four events");
    expect(receiver.rejected).toEqual([]);
  });

  it("expires a session whose time ran out while the fake was down, and says so by webhook", async () => {
    const dir = tempDirectory();
    cleanups.push(dir.remove);
    const receiver: Receiver = await startReceiver();
    cleanups.push(() => receiver.close());
    const first = await start(dir.path, receiver.url);
    const session = await permitFeeSession(clientFor(first.url));
    await first.stop();

    const file = path.join(dir.path, "state.json");
    const state = JSON.parse(readFileSync(file, "utf8"));
    state.sessions[session.id].expires_at = Math.floor(Date.now() / 1000) - 1;
    writeFileSync(file, JSON.stringify(state));

    const second = await start(dir.path, receiver.url);
    expect(await clientFor(second.url).checkout.sessions.retrieve(session.id)).toMatchObject({ status: "expired", url: null });
    await receiver.waitFor(() => receiver.types().includes("checkout.session.expired"), "checkout.session.expired");
  });

  it("starts empty, and keeps the broken file aside, when the state file cannot be read", async () => {
    const dir = tempDirectory();
    cleanups.push(dir.remove);
    writeFileSync(path.join(dir.path, "state.json"), "{ not json");
    const warn = console.warn;
    console.warn = () => undefined;
    try {
      const fake = await start(dir.path);
      expect(await fakeEvents(fake.url)).toEqual([]);
    } finally {
      console.warn = warn;
    }
    expect(readdirSync(dir.path).some((name) => name.startsWith("state.json.unreadable-"))).toBe(true);
  });
});
