import { NextRequest } from "next/server";
import { Op } from "sequelize";
import Stripe from "stripe";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { POST as webhook } from "@/app/api/webhooks/stripe/route";
import { AuditEvent, Equipment, FeeSchedule, OutboxMessage, Payment, ProcessorEvent, Project, Refund } from "@/models";
import { AppError } from "@/lib/errors";
import { formatUsd, type FeeLine } from "@/lib/fees";
import { seedDemoCatalog } from "@/lib/seed/demo-catalog";
import { DESIGN_MODELS, demoDesign, type CatalogIds } from "@/lib/seed/demo-designs";
import { saveDesignDraft } from "@/lib/server/data/designs";
import { getFeeSchedule, saveFeeSchedule } from "@/lib/server/data/fee-schedules";
import { FeeScheduleInput } from "@/lib/schemas/fee-schedule";
import { reconcilePendingPayments, refundPayment, startPayment } from "@/lib/server/data/payments";
import { getProjectFees, setDeclaredValuation } from "@/lib/server/data/project-fees";
import { db } from "@/lib/server/db";
import { getObjectBytes } from "@/lib/server/services/storage";
import { issueDueReceipts } from "@/lib/server/services/receipts";
import { closeDb } from "../../support/db";
import { makeOrganization, makeProject, type OrgFixture } from "../../support/fixtures";

// Payments run against the local test-mode fake the test stack starts (STRIPE_API_URL). Its webhooks
// cannot reach an app here, so each test fetches the events the fake made and delivers them itself:
// duplicated, reordered and forged, through the real route handler.
const FAKE = process.env.STRIPE_API_URL!;
const SECRET = process.env.STRIPE_WEBHOOK_SECRET!;
const CARDS = { ok: "4242424242424242", declined: "4000000000000002" };

let org: OrgFixture;
let rival: OrgFixture;
let ids: CatalogIds;
const signer = new Stripe("sk_test_unused", { telemetry: false });
const code = async (promise: Promise<unknown>) => promise.then(() => "resolved", (e: unknown) => (e instanceof AppError ? e.code : String(e)));

const line = (id: string, name: string, basis: FeeLine["basis"], extra: Partial<FeeLine> = {}): FeeLine => ({ id, name, effectiveFrom: "2026-01-01", effectiveUntil: null, basis, minimumCents: null, maximumCents: null, ...extra });

beforeAll(async () => {
  org = await makeOrganization("Fees");
  rival = await makeOrganization("Rival fees");
  await db().transaction((t) => seedDemoCatalog(org.organization.id, t));
  const items = await Equipment.findAll({ where: { organizationId: org.organization.id } });
  ids = Object.fromEntries(Object.entries(DESIGN_MODELS).map(([k, model]) => [k, items.find((i) => i.model === model)!.id])) as CatalogIds;
  // Invented schedules (demo): a per-kW permit with a minimum, a valuation share, a flat utility fee.
  await FeeSchedule.create({ organizationId: org.organization.id, authorityKind: "jurisdiction", authorityId: org.jurisdiction.id, updatedById: null, lines: [line("p", "Solar permit", { kind: "per-kw", size: "dc", rateCentsPerKw: 20_00 }, { minimumCents: 100_00 }), line("r", "Plan review", { kind: "valuation-percent", ratePercent: "0.5" })] });
  await FeeSchedule.create({ organizationId: org.organization.id, authorityKind: "utility", authorityId: org.utility.id, updatedById: null, lines: [line("u", "Interconnection application", { kind: "flat", amountCents: 125_00 })] });
});

afterAll(async () => {
  await closeDb();
});

async function projectWithDesign() {
  const project = await makeProject(org, { busbarA: 200, mainBreakerA: 200 });
  await saveDesignDraft({ viewer: org.viewers.coordinator, projectId: project.id, draft: demoDesign(ids, { busbarA: 200, mainBreakerA: 200 }, 0) });
  return project;
}

async function fake(path: string, body?: unknown) {
  const res = await fetch(`${FAKE}${path}`, body === undefined ? {} : { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
  return res.json();
}

/** The events the fake made for one checkout session, in the order it made them. */
async function eventsFor(sessionId: string, paymentIntentId?: string | null): Promise<Stripe.Event[]> {
  const all: { event: Stripe.Event }[] = (await fake("/_fake/events")).data;
  return all.map((e) => e.event).filter((e) => {
    const o = e.data.object as { id: string; payment_intent?: string | null; object: string };
    return o.id === sessionId || (paymentIntentId && (o.id === paymentIntentId || o.payment_intent === paymentIntentId));
  });
}

async function deliver(event: Stripe.Event, secret = SECRET) {
  const payload = JSON.stringify(event);
  const header = signer.webhooks.generateTestHeaderString({ payload, secret });
  const response = await webhook(new NextRequest("http://127.0.0.1/api/webhooks/stripe", { method: "POST", body: payload, headers: { "stripe-signature": header, "content-type": "application/json" } }));
  return { status: response.status, body: await response.json() };
}

describe("fee schedules", () => {
  it("an admin's schedule, parsed from the form at the edge, is stored as it parsed and kept to the organization", async () => {
    const utility = rival.utility;
    const lines = FeeScheduleInput.parse([{ id: "a", name: "Meter set", effectiveFrom: "2026-03-01", effectiveUntil: "", basis: { kind: "flat", amountUsd: "80" }, minimumUsd: "", maximumUsd: "" }]);
    await saveFeeSchedule({ viewer: rival.viewers.admin, authorityKind: "utility", authorityId: utility.id, lines });
    expect(await getFeeSchedule({ viewer: rival.viewers.admin, authorityKind: "utility", authorityId: utility.id })).toEqual([{ id: "a", name: "Meter set", effectiveFrom: "2026-03-01", effectiveUntil: null, basis: { kind: "flat", amountCents: 80_00 }, minimumCents: null, maximumCents: null }]);
    expect(await code(saveFeeSchedule({ viewer: org.viewers.admin, authorityKind: "utility", authorityId: utility.id, lines }))).toBe("NOT_FOUND");
    expect(await code(getFeeSchedule({ viewer: org.viewers.admin, authorityKind: "jurisdiction", authorityId: utility.id }))).toBe("NOT_FOUND");
  });
});

describe("fees and payments", () => {
  it("works out the fee lines from the design and valuation, with the working behind each", async () => {
    const project = await projectWithDesign();
    const before = await getProjectFees({ viewer: org.viewers.coordinator, projectId: project.id });
    expect(before.sizes?.dcKw).toBeGreaterThan(0);
    const review = before.lines.find((l) => l.name === "Plan review")!;
    expect(review.problem).toMatch(/valuation/i);
    const permit = before.lines.find((l) => l.name === "Solar permit")!;
    expect(permit.arithmetic.join(" ")).toMatch(/kW DC × \$20\.00/);
    await setDeclaredValuation({ viewer: org.viewers.coordinator, projectId: project.id, valuationCents: 24_000_00 });
    const after = await getProjectFees({ viewer: org.viewers.coordinator, projectId: project.id });
    expect(after.lines.find((l) => l.name === "Plan review")).toMatchObject({ amountCents: 120_00, problem: null }); // 0.5 % of $24,000
    expect(await code(getProjectFees({ viewer: rival.viewers.admin, projectId: project.id }))).toBe("NOT_FOUND");
  });

  it("pays with the succeeding card: duplicated and reordered webhooks make exactly one paid payment; a forged one changes nothing", async () => {
    const project = await projectWithDesign();
    const fees = await getProjectFees({ viewer: org.viewers.coordinator, projectId: project.id });
    const keys = fees.lines.filter((l) => !l.problem).map((l) => l.feeKey);
    const expected = fees.lines.filter((l) => !l.problem).reduce((s, l) => s + l.amountCents, 0);
    const { paymentId, checkoutUrl } = await startPayment({ viewer: org.viewers.coordinator, projectId: project.id, feeKeys: keys });
    expect(checkoutUrl).toContain("/pay/");
    const payment = (await Payment.findByPk(paymentId))!;
    expect(payment.amountCents).toBe(expected);

    await fake(`/_fake/checkout/sessions/${payment.checkoutSessionId}/pay`, { card: CARDS.ok });
    const events = await eventsFor(payment.checkoutSessionId!);
    const session = events.find((e) => e.type === "checkout.session.completed")!;
    expect(session).toBeDefined();
    // The forged event: right shape, signed with the wrong secret.
    expect((await deliver(session, "whsec_not_the_right_one")).status).toBe(400);
    expect((await Payment.findByPk(paymentId))!.status).toBe("pending");

    const intentId = (session.data.object as Stripe.Checkout.Session).payment_intent as string;
    const all = await eventsFor(payment.checkoutSessionId!, intentId);
    for (const event of [...all].reverse()) expect((await deliver(event)).status).toBe(200);
    for (const event of all) expect((await deliver(event)).body.outcome).toBe("duplicate");

    const paid = (await Payment.findByPk(paymentId))!;
    expect(paid).toMatchObject({ status: "paid", amountCents: expected, paymentIntentId: intentId, cardLast4: "4242" });
    expect(await Payment.count({ where: { paymentIntentId: intentId } })).toBe(1);
    expect(await ProcessorEvent.count({ where: { id: all.map((e) => e.id) } })).toBe(all.length);
    const now = await getProjectFees({ viewer: org.viewers.coordinator, projectId: project.id });
    expect(now.lines.filter((l) => keys.includes(l.feeKey)).every((l) => l.state === "paid")).toBe(true);
    expect(await code(startPayment({ viewer: org.viewers.coordinator, projectId: project.id, feeKeys: [keys[0]] }))).toBe("CONFLICT");

    // The receipt: a PDF in storage and an e-mail with it attached, issued once.
    expect(await issueDueReceipts()).toBeGreaterThanOrEqual(1);
    const receipted = (await Payment.findByPk(paymentId))!;
    expect(receipted.receiptNumber).toMatch(/^R-\d{4}-\d+-[0-9A-F]{6}$/);
    expect(Buffer.from((await getObjectBytes(receipted.receiptKey!)).slice(0, 5)).toString()).toBe("%PDF-");
    const mail = await OutboxMessage.findAll({ where: { subject: { [Op.like]: `Receipt ${receipted.receiptNumber}%` } } });
    expect(mail).toHaveLength(1);
    expect(mail[0].attachments).toEqual([{ fileName: `${receipted.receiptNumber}.pdf`, objectKey: receipted.receiptKey, contentType: "application/pdf" }]);
    await issueDueReceipts();
    expect(await OutboxMessage.count({ where: { subject: mail[0].subject } })).toBe(1);

    // Refunds: part, then the rest; the processor's refund events repeat them and change nothing.
    await refundPayment({ viewer: org.viewers.admin, paymentId, amountCents: 25_00, reason: "Plan review waived" });
    expect(await code(refundPayment({ viewer: org.viewers.coordinator, paymentId, amountCents: 1_00, reason: "nope" }))).toBe("FORBIDDEN");
    expect(await code(refundPayment({ viewer: org.viewers.admin, paymentId, amountCents: expected, reason: "too much" }))).toBe("INVALID_INPUT");
    const rest = await refundPayment({ viewer: org.viewers.admin, paymentId, amountCents: expected - 25_00, reason: "Permit withdrawn" });
    expect(rest).toMatchObject({ status: "refunded", refundedCents: expected });
    const notices = await OutboxMessage.findAll({ where: { toAddress: org.users.coordinator.email, subject: { [Op.like]: "Refund of %" } }, order: [["createdAt", "ASC"]] });
    const number = (await Project.findByPk(project.id))!.number;
    expect(notices.map((m) => m.subject)).toEqual([`Refund of $25.00 for project ${number}`, `Refund of ${formatUsd(expected - 25_00)} for project ${number}`]);
    expect(notices[0].textBody).toContain("Reason: Plan review waived");
    for (const event of (await eventsFor(payment.checkoutSessionId!, intentId)).filter((e) => e.type.startsWith("refund.") || e.type === "charge.refunded")) await deliver(event);
    expect(await Refund.count({ where: { paymentId } })).toBe(2);
    expect((await Payment.findByPk(paymentId))!.refundedCents).toBe(expected);
  });

  it("a declined card leaves the fees unpaid with the processor's message", async () => {
    const project = await projectWithDesign();
    const fees = await getProjectFees({ viewer: org.viewers.coordinator, projectId: project.id });
    const key = fees.lines.find((l) => l.name === "Interconnection application")!.feeKey;
    const { paymentId } = await startPayment({ viewer: org.viewers.coordinator, projectId: project.id, feeKeys: [key] });
    const payment = (await Payment.findByPk(paymentId))!;
    await fake(`/_fake/checkout/sessions/${payment.checkoutSessionId}/pay`, { card: CARDS.declined });
    const session = await fetch(`${FAKE}/v1/checkout/sessions/${payment.checkoutSessionId}`, { headers: { authorization: `Bearer ${process.env.STRIPE_SECRET_KEY}` } }).then((r) => r.json());
    const intentId = (session as { payment_intent: string | null }).payment_intent;
    for (const event of await eventsFor(payment.checkoutSessionId!, intentId)) await deliver(event);
    expect((await Payment.findByPk(paymentId))!).toMatchObject({ status: "pending", failureMessage: "Your card was declined." });
    const after = await getProjectFees({ viewer: org.viewers.coordinator, projectId: project.id });
    expect(after.lines.find((l) => l.feeKey === key)!.state).toBe("unpaid");

    // Paying again replaces the open checkout, so the fee can never be paid twice.
    const second = await startPayment({ viewer: org.viewers.coordinator, projectId: project.id, feeKeys: [key] });
    expect((await Payment.findByPk(paymentId))!.status).toBe("expired");
    expect(second.paymentId).not.toBe(paymentId);
  });

  it("ignores a signed event for a payment Ohmstead did not start, even with odd metadata", async () => {
    const event = { id: `evt_foreign_${Date.now()}`, object: "event", type: "checkout.session.completed", created: 1, livemode: false, api_version: null, pending_webhooks: 1, request: { id: null, idempotency_key: null }, data: { object: { id: "cs_test_not_ours", object: "checkout.session", payment_status: "paid", payment_intent: "pi_not_ours", metadata: { paymentId: "order-42" } } } } as unknown as Stripe.Event;
    expect(await deliver(event)).toEqual({ status: 200, body: { received: true, outcome: "ignored" } });
    expect(await deliver(event)).toEqual({ status: 200, body: { received: true, outcome: "duplicate" } });
  });

  it("reconciles a payment whose webhook never arrived by asking the processor", async () => {
    const project = await projectWithDesign();
    const fees = await getProjectFees({ viewer: org.viewers.coordinator, projectId: project.id });
    const { paymentId } = await startPayment({ viewer: org.viewers.coordinator, projectId: project.id, feeKeys: [fees.lines.find((l) => !l.problem)!.feeKey] });
    const payment = (await Payment.findByPk(paymentId))!;
    await fake(`/_fake/checkout/sessions/${payment.checkoutSessionId}/pay`, { card: CARDS.ok });
    expect((await Payment.findByPk(paymentId))!.status).toBe("pending"); // no webhook delivered: the "crash"
    await reconcilePendingPayments({ olderThanMs: 0 });
    expect((await Payment.findByPk(paymentId))!).toMatchObject({ status: "paid", cardLast4: "4242" });
  });
});

describe("refunds under pressure", () => {
  async function paidPayment() {
    const project = await projectWithDesign();
    const fees = await getProjectFees({ viewer: org.viewers.coordinator, projectId: project.id });
    const keys = fees.lines.filter((l) => !l.problem).map((l) => l.feeKey);
    const { paymentId } = await startPayment({ viewer: org.viewers.coordinator, projectId: project.id, feeKeys: keys });
    const payment = (await Payment.findByPk(paymentId))!;
    await fake(`/_fake/checkout/sessions/${payment.checkoutSessionId}/pay`, { card: CARDS.ok });
    const session = (await eventsFor(payment.checkoutSessionId!)).find((e) => e.type === "checkout.session.completed")!;
    const intentId = (session.data.object as Stripe.Checkout.Session).payment_intent as string;
    for (const event of await eventsFor(payment.checkoutSessionId!, intentId)) await deliver(event);
    return (await Payment.findByPk(paymentId))!;
  }
  const refundMail = async (projectId: string) => {
    const number = (await Project.findByPk(projectId))!.number;
    return OutboxMessage.count({ where: { subject: { [Op.like]: `Refund of % for project ${number}` } } });
  };
  const audits = (projectId: string) => AuditEvent.count({ where: { action: "payment.refunded", entityId: projectId } });

  it("makes one refund, one e-mail and one audit entry from concurrent requests", async () => {
    // Defect: five admins' clicks made one refund at the processor but five e-mails and five audit rows.
    const payment = await paidPayment();
    const mailBefore = await refundMail(payment.projectId);
    const results = await Promise.all(Array.from({ length: 5 }, () => code(refundPayment({ viewer: org.viewers.admin, paymentId: payment.id, amountCents: 10_00, reason: "Fee waived" }))));
    expect(results.filter((r) => r === "resolved").length).toBeGreaterThanOrEqual(1);
    expect(await Refund.count({ where: { paymentId: payment.id } })).toBe(1);
    expect((await Payment.findByPk(payment.id))!.refundedCents).toBe(10_00);
    expect((await refundMail(payment.projectId)) - mailBefore).toBe(1);
    expect(await audits(payment.projectId)).toBe(1);
  });

  it("shows the processor's reason when it refuses a refund", async () => {
    const payment = await paidPayment();
    // Refunded in full at the processor, outside Ohmstead: its next refund is refused.
    await fetch(`${FAKE}/v1/refunds`, { method: "POST", headers: { authorization: `Bearer ${process.env.STRIPE_SECRET_KEY}`, "content-type": "application/x-www-form-urlencoded" }, body: `payment_intent=${payment.paymentIntentId}` });
    const refused = await refundPayment({ viewer: org.viewers.admin, paymentId: payment.id, amountCents: 5_00, reason: "Second thoughts" }).catch((e: AppError) => e);
    expect(refused).toMatchObject({ code: "CONFLICT" });
    expect((refused as AppError).message).toMatch(/^The payment service refused the refund: .*already been refunded/);
  });

  it("stops counting a refund the processor later marks failed", async () => {
    const payment = await paidPayment();
    const after = await refundPayment({ viewer: org.viewers.admin, paymentId: payment.id, amountCents: payment.amountCents, reason: "Project cancelled" });
    expect(after).toMatchObject({ status: "refunded", refundedCents: payment.amountCents });
    const refund = (await Refund.findOne({ where: { paymentId: payment.id } }))!;
    await fake(`/_fake/refunds/${refund.processorRefundId}/fail`, {});
    const events = (await eventsFor(payment.checkoutSessionId!, payment.paymentIntentId)).filter((e) => e.type.startsWith("refund."));
    expect(events.map((e) => e.type)).toEqual(expect.arrayContaining(["refund.failed", "refund.updated"]));
    // Delivered in any order, with the earlier charge.refunded last: the failure stands.
    for (const event of [...events].reverse()) await deliver(event);
    for (const event of (await eventsFor(payment.checkoutSessionId!, payment.paymentIntentId)).filter((e) => e.type === "charge.refunded")) await deliver(event);
    expect((await Payment.findByPk(payment.id))!).toMatchObject({ status: "paid", refundedCents: 0 });
    expect((await Refund.findByPk(refund.id))!.status).toBe("failed");
    const fees = await getProjectFees({ viewer: org.viewers.admin, projectId: payment.projectId });
    expect(fees.payments.find((p) => p.id === payment.id)!.refunds[0]!.failed).toBe(true);
  });
});
