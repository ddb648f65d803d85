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
import { reconcilePendingPayments, refundPayment, startPayment } from "@/lib/server/use-cases/payments";
import { getProjectFees, setDeclaredValuation } from "@/lib/server/data/project-fees";
import { db } from "@/lib/server/db";
import { getObjectBytes } from "@/lib/server/services/storage";
import { issueDueReceipts } from "@/lib/server/jobs/issue-receipts";
import { closeDb } from "../../support/db";
import { makeOrganization, makeProject, type OrgFixture } from "../../support/fixtures";
import { readsOf, sqlDuring } from "../../support/query-log";

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
const code = async (promise: Promise<unknown>) =>
  promise.then(
    () => "resolved",
    (e: unknown) => (e instanceof AppError ? e.code : String(e)),
  );

const line = (id: string, name: string, basis: FeeLine["basis"], extra: Partial<FeeLine> = {}): FeeLine => ({
  id,
  name,
  effectiveFrom: "2026-01-01",
  effectiveUntil: null,
  basis,
  minimumCents: null,
  maximumCents: null,
  ...extra,
});

beforeAll(async () => {
  org = await makeOrganization("Fees");
  rival = await makeOrganization("Rival fees");
  await db().transaction((t) => seedDemoCatalog(org.organization.id, t));
  const items = await Equipment.findAll({ where: { organizationId: org.organization.id } });
  ids = Object.fromEntries(Object.entries(DESIGN_MODELS).map(([k, model]) => [k, items.find((i) => i.model === model)!.id])) as CatalogIds;
  // Invented schedules (demo): a per-kW permit with a minimum, a valuation share, a flat utility fee.
  await FeeSchedule.create({
    organizationId: org.organization.id,
    authorityKind: "jurisdiction",
    authorityId: org.jurisdiction.id,
    updatedById: null,
    lines: [
      line("p", "Solar permit", { kind: "per-kw", size: "dc", rateCentsPerKw: 20_00 }, { minimumCents: 100_00 }),
      line("r", "Plan review", { kind: "valuation-percent", ratePercent: "0.5" }),
    ],
  });
  await FeeSchedule.create({
    organizationId: org.organization.id,
    authorityKind: "utility",
    authorityId: org.utility.id,
    updatedById: null,
    lines: [line("u", "Interconnection application", { kind: "flat", amountCents: 125_00 })],
  });
});

afterAll(async () => {
  await closeDb();
});

async function projectWithDesign() {
  const project = await makeProject(org, { busbarA: 200, mainBreakerA: 200 });
  await saveDesignDraft({
    viewer: org.viewers.coordinator,
    projectId: project.id,
    draft: demoDesign(ids, { busbarA: 200, mainBreakerA: 200 }, 0),
  });
  return project;
}

async function fake(path: string, body?: unknown) {
  const res = await fetch(
    `${FAKE}${path}`,
    body === undefined ? {} : { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(body) },
  );
  return res.json();
}

/** The events the fake made for one checkout session, in the order it made them. */
async function eventsFor(sessionId: string, paymentIntentId?: string | null): Promise<Stripe.Event[]> {
  const all: { event: Stripe.Event }[] = (await fake("/_fake/events")).data;
  return all
    .map((e) => e.event)
    .filter((e) => {
      const o = e.data.object as { id: string; payment_intent?: string | null; object: string };
      return o.id === sessionId || (paymentIntentId && (o.id === paymentIntentId || o.payment_intent === paymentIntentId));
    });
}

async function deliver(event: Stripe.Event, secret = SECRET) {
  const payload = JSON.stringify(event);
  const header = signer.webhooks.generateTestHeaderString({ payload, secret });
  const response = await webhook(
    new NextRequest("http://127.0.0.1/api/webhooks/stripe", {
      method: "POST",
      body: payload,
      headers: { "stripe-signature": header, "content-type": "application/json" },
    }),
  );
  return { status: response.status, body: await response.json() };
}

describe("fee schedules", () => {
  it("an admin's schedule, parsed from the form at the edge, is stored as it parsed and kept to the organization", async () => {
    const utility = rival.utility;
    const lines = FeeScheduleInput.parse([
      {
        id: "a",
        name: "Meter set",
        effectiveFrom: "2026-03-01",
        effectiveUntil: "",
        basis: { kind: "flat", amountUsd: "80" },
        minimumUsd: "",
        maximumUsd: "",
      },
    ]);
    await saveFeeSchedule({ viewer: rival.viewers.admin, authorityKind: "utility", authorityId: utility.id, lines });
    expect(await getFeeSchedule({ viewer: rival.viewers.admin, authorityKind: "utility", authorityId: utility.id })).toEqual([
      {
        id: "a",
        name: "Meter set",
        effectiveFrom: "2026-03-01",
        effectiveUntil: null,
        basis: { kind: "flat", amountCents: 80_00 },
        minimumCents: null,
        maximumCents: null,
      },
    ]);
    expect(await code(saveFeeSchedule({ viewer: org.viewers.admin, authorityKind: "utility", authorityId: utility.id, lines }))).toBe(
      "NOT_FOUND",
    );
    expect(await code(getFeeSchedule({ viewer: org.viewers.admin, authorityKind: "jurisdiction", authorityId: utility.id }))).toBe(
      "NOT_FOUND",
    );
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

  it("counts a fee that waits for the valuation or the design at its minimum, in the unpaid total too", async () => {
    // Invented schedule (demo): 1 % of the valuation with a $60.00 minimum, 0.5 % with none, $30.00/kW DC with a $100.00 minimum.
    const own = await makeOrganization("Fees at least");
    await FeeSchedule.create({
      organizationId: own.organization.id,
      authorityKind: "jurisdiction",
      authorityId: own.jurisdiction.id,
      updatedById: null,
      lines: [
        line("b", "Building permit", { kind: "valuation-percent", ratePercent: "1" }, { minimumCents: 60_00 }),
        line("r", "Records fee", { kind: "valuation-percent", ratePercent: "0.5" }),
        line("k", "Electrical permit", { kind: "per-kw", size: "dc", rateCentsPerKw: 30_00 }, { minimumCents: 100_00 }),
      ],
    });
    const project = await makeProject(own); // no design saved: the size is not known
    const before = await getProjectFees({ viewer: own.viewers.coordinator, projectId: project.id });
    const byName = (name: string) => before.lines.find((l) => l.name === name)!;
    expect(byName("Building permit")).toMatchObject({
      amountCents: 60_00,
      problemCode: "valuation-missing",
      state: "unpaid",
      payable: false,
    });
    expect(byName("Records fee")).toMatchObject({ amountCents: 0, problemCode: "valuation-missing", payable: false });
    expect(byName("Electrical permit")).toMatchObject({ amountCents: 100_00, problemCode: "size-missing", payable: false });
    expect(byName("Electrical permit").problem).toMatch(/design/);
    // $60.00 + $0.00 + $100.00, the least the fees come to
    expect(before).toMatchObject({ unpaidTotalCents: 160_00, unpaidIsAtLeast: true });
    expect(
      await code(startPayment({ viewer: own.viewers.coordinator, projectId: project.id, feeKeys: [byName("Building permit").feeKey] })),
    ).toBe("CONFLICT");

    // $4,000.00 declared: 1 % is $40.00, raised to the $60.00 minimum; 0.5 % is $20.00.
    await setDeclaredValuation({ viewer: own.viewers.coordinator, projectId: project.id, valuationCents: 4_000_00 });
    const after = await getProjectFees({ viewer: own.viewers.coordinator, projectId: project.id });
    expect(after.lines.find((l) => l.name === "Building permit")).toMatchObject({ amountCents: 60_00, problemCode: null, payable: true });
    expect(after.lines.find((l) => l.name === "Records fee")).toMatchObject({ amountCents: 20_00, payable: true });
    expect(after).toMatchObject({ unpaidTotalCents: 180_00, unpaidIsAtLeast: true }); // the electrical permit still waits for the design
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
    expect(mail[0].attachments).toEqual([
      { fileName: `${receipted.receiptNumber}.pdf`, objectKey: receipted.receiptKey, contentType: "application/pdf" },
    ]);
    await issueDueReceipts();
    expect(await OutboxMessage.count({ where: { subject: mail[0].subject } })).toBe(1);

    // Refunds: part, then the rest; the processor's refund events repeat them and change nothing.
    await refundPayment({ viewer: org.viewers.admin, paymentId, amountCents: 25_00, reason: "Plan review waived" });
    expect(await code(refundPayment({ viewer: org.viewers.coordinator, paymentId, amountCents: 1_00, reason: "nope" }))).toBe("FORBIDDEN");
    expect(await code(refundPayment({ viewer: org.viewers.admin, paymentId, amountCents: expected, reason: "too much" }))).toBe(
      "INVALID_INPUT",
    );
    const rest = await refundPayment({ viewer: org.viewers.admin, paymentId, amountCents: expected - 25_00, reason: "Permit withdrawn" });
    expect(rest).toMatchObject({ status: "refunded", refundedCents: expected });
    const notices = await OutboxMessage.findAll({
      where: { toAddress: org.users.coordinator.email, subject: { [Op.like]: "Refund of %" } },
      order: [["createdAt", "ASC"]],
    });
    const number = (await Project.findByPk(project.id))!.number;
    expect(notices.map((m) => m.subject)).toEqual([
      `Refund of $25.00 for project ${number}`,
      `Refund of ${formatUsd(expected - 25_00)} for project ${number}`,
    ]);
    expect(notices[0].textBody).toContain("Reason: Plan review waived");
    for (const event of (await eventsFor(payment.checkoutSessionId!, intentId)).filter(
      (e) => e.type.startsWith("refund.") || e.type === "charge.refunded",
    ))
      await deliver(event);
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
    const session = await fetch(`${FAKE}/v1/checkout/sessions/${payment.checkoutSessionId}`, {
      headers: { authorization: `Bearer ${process.env.STRIPE_SECRET_KEY}` },
    }).then((r) => r.json());
    const intentId = (session as { payment_intent: string | null }).payment_intent;
    for (const event of await eventsFor(payment.checkoutSessionId!, intentId)) await deliver(event);
    expect((await Payment.findByPk(paymentId))!).toMatchObject({ status: "pending", failureMessage: "Your card was declined." });
    const after = await getProjectFees({ viewer: org.viewers.coordinator, projectId: project.id });
    expect(after.lines.find((l) => l.feeKey === key)!.state).toBe("unpaid");

    expect(after.payments.find((p) => p.id === paymentId)!.failureStillOpen).toBe(true);

    // Paying again replaces the open checkout, so the fee can never be paid twice.
    const second = await startPayment({ viewer: org.viewers.coordinator, projectId: project.id, feeKeys: [key] });
    expect((await Payment.findByPk(paymentId))!.status).toBe("expired");
    expect(second.paymentId).not.toBe(paymentId);
    // With another checkout under way for the fee, the declined one no longer asks for another card.
    const paying = await getProjectFees({ viewer: org.viewers.coordinator, projectId: project.id });
    expect(paying.lines.find((l) => l.feeKey === key)!.state).toBe("in-progress");
    expect(paying.payments.find((p) => p.id === paymentId)!.failureStillOpen).toBe(false);

    // Once another card pays the fee, the declined attempt no longer tells anyone to pay again.
    const replacement = (await Payment.findByPk(second.paymentId))!;
    await fake(`/_fake/checkout/sessions/${replacement.checkoutSessionId}/pay`, { card: CARDS.ok });
    const done = (await eventsFor(replacement.checkoutSessionId!)).find((e) => e.type === "checkout.session.completed")!;
    for (const event of await eventsFor(
      replacement.checkoutSessionId!,
      (done.data.object as Stripe.Checkout.Session).payment_intent as string,
    ))
      await deliver(event);
    const paidNow = await getProjectFees({ viewer: org.viewers.coordinator, projectId: project.id });
    expect(paidNow.lines.find((l) => l.feeKey === key)!.state).toBe("paid");
    expect(paidNow.payments.find((p) => p.id === paymentId)).toMatchObject({
      failureMessage: "Your card was declined.",
      failureStillOpen: false,
    });
  });

  it("reads the project once and reviews its design once to start a payment, also when it first ends an unfinished checkout", async () => {
    const project = await projectWithDesign();
    const fees = await getProjectFees({ viewer: org.viewers.coordinator, projectId: project.id });
    const key = fees.lines.find((l) => l.name === "Interconnection application")!.feeKey;
    for (const round of ["first", "replacing the open checkout"]) {
      const { sql } = await sqlDuring(() => startPayment({ viewer: org.viewers.coordinator, projectId: project.id, feeKeys: [key] }));
      expect(readsOf(sql, "projects"), round).toHaveLength(1);
      expect(readsOf(sql, "designs"), round).toHaveLength(1);
      expect(readsOf(sql, "jurisdictions"), round).toHaveLength(1);
    }
  });

  it("ignores a signed event for a payment Ohmstead did not start, even with odd metadata", async () => {
    const event = {
      id: `evt_foreign_${Date.now()}`,
      object: "event",
      type: "checkout.session.completed",
      created: 1,
      livemode: false,
      api_version: null,
      pending_webhooks: 1,
      request: { id: null, idempotency_key: null },
      data: {
        object: {
          id: "cs_test_not_ours",
          object: "checkout.session",
          payment_status: "paid",
          payment_intent: "pi_not_ours",
          metadata: { paymentId: "order-42" },
        },
      },
    } as unknown as Stripe.Event;
    expect(await deliver(event)).toEqual({ status: 200, body: { received: true, outcome: "ignored" } });
    expect(await deliver(event)).toEqual({ status: 200, body: { received: true, outcome: "duplicate" } });
  });

  it("reconciles a payment whose webhook never arrived by asking the processor", async () => {
    const project = await projectWithDesign();
    const fees = await getProjectFees({ viewer: org.viewers.coordinator, projectId: project.id });
    const { paymentId } = await startPayment({
      viewer: org.viewers.coordinator,
      projectId: project.id,
      feeKeys: [fees.lines.find((l) => !l.problem)!.feeKey],
    });
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
    const results = await Promise.all(
      Array.from({ length: 5 }, () =>
        code(refundPayment({ viewer: org.viewers.admin, paymentId: payment.id, amountCents: 10_00, reason: "Fee waived" })),
      ),
    );
    expect(results.filter((r) => r === "resolved").length).toBeGreaterThanOrEqual(1);
    expect(await Refund.count({ where: { paymentId: payment.id } })).toBe(1);
    expect((await Payment.findByPk(payment.id))!.refundedCents).toBe(10_00);
    expect((await refundMail(payment.projectId)) - mailBefore).toBe(1);
    expect(await audits(payment.projectId)).toBe(1);
  });

  it("a refund naming a fee makes it unpaid again; money alone leaves the fees paid until all of it is returned", async () => {
    const payment = await paidPayment();
    const fees = () => getProjectFees({ viewer: org.viewers.admin, projectId: payment.projectId });
    const states = async () =>
      Object.fromEntries((await fees()).lines.filter((l) => l.name !== "Plan review").map((l) => [l.name, l.state]));
    const utility = (await fees()).lines.find((l) => l.name === "Interconnection application")!;
    const permit = (await fees()).lines.find((l) => l.name === "Solar permit")!;
    expect(payment.amountCents).toBe(utility.amountCents + permit.amountCents);
    expect(permit.amountCents).toBeGreaterThanOrEqual(125_00); // at least its $100.00 minimum: 7.6 kW DC × $20.00 = $152.00

    // Money equal to the utility fee's $125.00, not tied to it: which fee it was for is not known, so both stay paid.
    await refundPayment({ viewer: org.viewers.admin, paymentId: payment.id, amountCents: 125_00, reason: "Overcharged" });
    expect(await states()).toEqual({ "Solar permit": "paid", "Interconnection application": "paid" });
    expect((await Payment.findByPk(payment.id))!.status).toBe("partially_refunded");

    // The utility fee refunded as a line: the server works out its amount, and the line is unpaid again.
    expect(await code(refundPayment({ viewer: org.viewers.admin, paymentId: payment.id, feeKeys: ["not-a-line"], reason: "Wrong" }))).toBe(
      "CONFLICT",
    );
    const after = await refundPayment({
      viewer: org.viewers.admin,
      paymentId: payment.id,
      feeKeys: [utility.feeKey],
      reason: "Application withdrawn",
    });
    expect(after.refunds.find((r) => r.lineNames.length)).toMatchObject({
      amountCents: 125_00,
      lineNames: ["Interconnection application"],
    });
    expect(Object.fromEntries(after.lines.map((l) => [l.name, l.refunded]))).toEqual({
      "Solar permit": false,
      "Interconnection application": true,
    });
    expect(await states()).toEqual({ "Solar permit": "paid", "Interconnection application": "refunded" });
    const now = await fees();
    expect(now.lines.find((l) => l.feeKey === utility.feeKey)).toMatchObject({ payable: true, paymentId: payment.id });
    expect(now.unpaidTotalCents).toBe(
      now.lines.filter((l) => l.state === "unpaid" || l.state === "refunded").reduce((sum, l) => sum + l.amountCents, 0),
    );
    expect(
      now.lines
        .filter((l) => l.state === "unpaid" || l.state === "refunded")
        .map((l) => l.name)
        .sort(),
    ).toEqual(["Interconnection application", "Plan review"]);
    expect(
      await code(refundPayment({ viewer: org.viewers.admin, paymentId: payment.id, feeKeys: [utility.feeKey], reason: "Again" })),
    ).toBe("CONFLICT");
    // The permit as a line no longer fits: $125.00 of money already went back.
    expect(
      await code(refundPayment({ viewer: org.viewers.admin, paymentId: payment.id, feeKeys: [permit.feeKey], reason: "Too much" })),
    ).toBe("CONFLICT");

    // The rest as money: the payment is refunded in full, so every line is given back.
    await refundPayment({
      viewer: org.viewers.admin,
      paymentId: payment.id,
      amountCents: permit.amountCents - 125_00,
      reason: "Project cancelled",
    });
    expect((await Payment.findByPk(payment.id))!.status).toBe("refunded");
    expect(await states()).toEqual({ "Solar permit": "refunded", "Interconnection application": "refunded" });

    // Paying the utility fee again makes it paid by the new payment.
    const { paymentId } = await startPayment({ viewer: org.viewers.coordinator, projectId: payment.projectId, feeKeys: [utility.feeKey] });
    expect((await Payment.findByPk(paymentId))!.amountCents).toBe(125_00);

    // The processor's refund events, delivered late, keep the fee lines each refund named.
    for (const event of (await eventsFor(payment.checkoutSessionId!, payment.paymentIntentId)).filter((e) => e.type.startsWith("refund.")))
      await deliver(event);
    const named = await Refund.findAll({ where: { paymentId: payment.id }, order: [["createdAt", "ASC"]] });
    expect(named.map((r) => r.feeKeys)).toEqual([[], [utility.feeKey], []]);
  });

  it("records the fees a refund named even when the processor's event arrives before the admin's call is recorded", async () => {
    const payment = await paidPayment();
    const line = (await getProjectFees({ viewer: org.viewers.admin, projectId: payment.projectId })).lines.find(
      (l) => l.name === "Interconnection application",
    )!;
    // The refund made at the processor with Ohmstead's metadata, and recorded from its webhook only.
    const created = await fetch(`${FAKE}/v1/refunds`, {
      method: "POST",
      headers: { authorization: `Bearer ${process.env.STRIPE_SECRET_KEY}`, "content-type": "application/x-www-form-urlencoded" },
      body: new URLSearchParams({
        payment_intent: payment.paymentIntentId!,
        amount: String(line.amountCents),
        "metadata[paymentId]": payment.id,
        "metadata[feeKeys]": JSON.stringify([line.feeKey]),
      }).toString(),
    }).then((r) => r.json());
    expect(created.id).toBeTruthy();
    for (const event of (await eventsFor(payment.checkoutSessionId!, payment.paymentIntentId)).filter((e) => e.type.startsWith("refund.")))
      await deliver(event);
    expect((await Refund.findOne({ where: { processorRefundId: created.id } }))!.feeKeys).toEqual([line.feeKey]);
    expect(
      (await getProjectFees({ viewer: org.viewers.admin, projectId: payment.projectId })).lines.find((l) => l.feeKey === line.feeKey)!
        .state,
    ).toBe("refunded");
  });

  it("shows the processor's reason when it refuses a refund", async () => {
    const payment = await paidPayment();
    // Refunded in full at the processor, outside Ohmstead: its next refund is refused.
    await fetch(`${FAKE}/v1/refunds`, {
      method: "POST",
      headers: { authorization: `Bearer ${process.env.STRIPE_SECRET_KEY}`, "content-type": "application/x-www-form-urlencoded" },
      body: `payment_intent=${payment.paymentIntentId}`,
    });
    const refused = await refundPayment({
      viewer: org.viewers.admin,
      paymentId: payment.id,
      amountCents: 5_00,
      reason: "Second thoughts",
    }).catch((e: AppError) => e);
    expect(refused).toMatchObject({ code: "CONFLICT" });
    expect((refused as AppError).message).toMatch(/^The payment service refused the refund: .*already been refunded/);
  });

  it("stops counting a refund the processor later marks failed", async () => {
    const payment = await paidPayment();
    const after = await refundPayment({
      viewer: org.viewers.admin,
      paymentId: payment.id,
      amountCents: payment.amountCents,
      reason: "Project cancelled",
    });
    expect(after).toMatchObject({ status: "refunded", refundedCents: payment.amountCents });
    const refund = (await Refund.findOne({ where: { paymentId: payment.id } }))!;
    await fake(`/_fake/refunds/${refund.processorRefundId}/fail`, {});
    const events = (await eventsFor(payment.checkoutSessionId!, payment.paymentIntentId)).filter((e) => e.type.startsWith("refund."));
    expect(events.map((e) => e.type)).toEqual(expect.arrayContaining(["refund.failed", "refund.updated"]));
    // Delivered in any order, with the earlier charge.refunded last: the failure stands.
    for (const event of [...events].reverse()) await deliver(event);
    for (const event of (await eventsFor(payment.checkoutSessionId!, payment.paymentIntentId)).filter((e) => e.type === "charge.refunded"))
      await deliver(event);
    expect((await Payment.findByPk(payment.id))!).toMatchObject({ status: "paid", refundedCents: 0 });
    expect((await Refund.findByPk(refund.id))!.status).toBe("failed");
    const fees = await getProjectFees({ viewer: org.viewers.admin, projectId: payment.projectId });
    expect(fees.payments.find((p) => p.id === payment.id)!.refunds[0]!.failed).toBe(true);
  });
});
