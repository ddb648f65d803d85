import "server-only";
import { Payment, PaymentLine, Project, Refund, User } from "@/models";
import { runDesignReview } from "@/lib/design/run-review";
import { can, type Viewer } from "@/lib/domain/permissions";
import { localIsoDate } from "@/lib/domain/time-zones";
import { AppError } from "@/lib/errors";
import { computeFees, feeNameKey } from "@/lib/fees";
import type { PaymentStatus } from "@/models/payment";
import { db } from "../db";
import { getDesignWithContext } from "./designs";
import { recordAudit } from "./audit";
import { schedulesForProject } from "./fee-schedules";
import { getOrganization } from "./organizations";

export type FeeLineState = "unpaid" | "in-progress" | "paid";

export type ProjectFeeLineDto = {
  feeKey: string;
  authority: string;
  authorityKind: "jurisdiction" | "utility";
  name: string;
  arithmetic: string[];
  amountCents: number;
  problem: string | null; // why the line cannot be paid yet
  state: FeeLineState;
  paymentId: string | null;
};

export type PaymentDto = {
  id: string;
  status: PaymentStatus;
  amountCents: number;
  refundedCents: number;
  card: string | null;
  failureMessage: string | null;
  receiptNumber: string | null;
  hasReceipt: boolean;
  paidAt: string | null;
  createdAt: string;
  createdBy: string | null;
  lines: { name: string; authority: string; amountCents: number }[];
  refunds: { id: string; amountCents: number; reason: string | null; createdAt: string; createdBy: string | null; failed: boolean }[];
};

export type ProjectFeesDto = {
  asOf: string;
  sizes: { dcKw: number; acKw: number } | null; // null while the design cannot be reviewed
  valuationCents: number | null;
  lines: ProjectFeeLineDto[];
  unpaidTotalCents: number;
  payments: PaymentDto[];
};

/** Paid lines stay paid whatever the design does later; a fully refunded payment frees its lines again. */
const HOLDS_LINES: PaymentStatus[] = ["pending", "paid", "partially_refunded"];

export const feeKeyOf = (kind: string, authorityId: string, name: string) => `${kind}:${authorityId}:${feeNameKey(name)}`;

export function toPaymentDto(p: Payment): PaymentDto {
  return {
    id: p.id,
    status: p.status,
    amountCents: p.amountCents,
    refundedCents: p.refundedCents,
    card: p.cardBrand || p.cardLast4 ? `${p.cardBrand ?? "card"} •••• ${p.cardLast4 ?? "????"}` : null,
    failureMessage: p.failureMessage,
    receiptNumber: p.receiptNumber,
    hasReceipt: Boolean(p.receiptKey),
    paidAt: p.paidAt?.toISOString() ?? null,
    createdAt: p.createdAt.toISOString(),
    createdBy: p.createdBy?.name ?? null,
    lines: (p.lines ?? []).map((l) => ({ name: l.name, authority: l.authority, amountCents: l.amountCents })),
    refunds: (p.refunds ?? []).map((r) => ({ id: r.id, amountCents: r.amountCents, reason: r.reason, createdAt: r.createdAt.toISOString(), createdBy: r.createdBy?.name ?? null, failed: r.status === "failed" })),
  };
}

export const PAYMENT_INCLUDE = [
  { model: PaymentLine, as: "lines" },
  { model: Refund, as: "refunds", include: [{ model: User, as: "createdBy", attributes: ["name"] }] },
  { model: User, as: "createdBy", attributes: ["name"] },
];

/**
 * The project's fees today: every line of its AHJ's and utility's schedules worked out from the
 * reviewed design and the declared valuation, next to what is already paid. Unpaid lines follow
 * the design; paid ones keep the amount they were paid at.
 */
export async function getProjectFees({ viewer, projectId }: { viewer: Viewer; projectId: string }): Promise<ProjectFeesDto> {
  db();
  const { project, design, catalog, conditions } = await getDesignWithContext({ viewer, projectId });
  const outcome = runDesignReview(design.draft, catalog, conditions);
  const sizes = outcome.status === "reviewed" ? { dcKw: outcome.review.summary.ratings.dcKw, acKw: outcome.review.summary.ratings.acKw } : null;
  const valuationCents = project.declaredValuationCents;
  const asOf = localIsoDate(new Date().toISOString(), (await getOrganization({ viewer })).timeZone);

  const schedules = await schedulesForProject(viewer, project);
  const payments = await Payment.findAll({ where: { projectId, organizationId: viewer.organizationId }, include: PAYMENT_INCLUDE, order: [["createdAt", "DESC"]] });
  const holding = new Map<string, Payment>();
  for (const p of payments.filter((p) => HOLDS_LINES.includes(p.status))) for (const l of p.lines ?? []) if (!holding.has(l.feeKey) || p.status !== "pending") holding.set(l.feeKey, p);

  const lines: ProjectFeeLineDto[] = [];
  for (const schedule of schedules) {
    const computed = computeFees({ lines: schedule.lines.map((l) => ({ ...l, authority: schedule.name })), facts: { dcKw: sizes?.dcKw ?? 0, acKw: sizes?.acKw ?? 0, valuationCents, asOf } });
    for (const line of computed.lines) {
      const feeKey = feeKeyOf(schedule.kind, schedule.id, line.name);
      const payment = holding.get(feeKey) ?? null;
      const paidLine = payment && payment.status !== "pending" ? payment.lines!.find((l) => l.feeKey === feeKey)! : null;
      const needsSize = line.kind !== "flat" && line.kind !== "valuation-percent";
      const problem = line.problem?.message ?? (needsSize && !sizes ? "The design is not complete yet, so the system size is not known." : null);
      lines.push({
        feeKey,
        authority: schedule.name,
        authorityKind: schedule.kind,
        name: line.name,
        arithmetic: paidLine ? paidLine.arithmetic : line.arithmetic,
        amountCents: paidLine ? paidLine.amountCents : line.amountCents,
        problem: paidLine ? null : problem,
        // A declined card leaves its checkout open but the fee unpaid; paying again replaces that checkout.
        state: !payment || (payment.status === "pending" && payment.failureMessage) ? "unpaid" : payment.status === "pending" ? "in-progress" : "paid",
        paymentId: payment?.id ?? null,
      });
    }
  }
  const unpaidTotalCents = lines.filter((l) => l.state === "unpaid").reduce((sum, l) => sum + l.amountCents, 0);
  return { asOf, sizes, valuationCents, lines, unpaidTotalCents, payments: payments.map(toPaymentDto) };
}

/** The valuation the owner declared for the work; fees that are a percentage of it follow. */
export async function setDeclaredValuation({ viewer, projectId, valuationCents }: { viewer: Viewer; projectId: string; valuationCents: number | null }) {
  const sequelize = db();
  await sequelize.transaction(async (transaction) => {
    const project = await Project.findOne({ where: { id: projectId, organizationId: viewer.organizationId }, transaction, lock: transaction.LOCK.UPDATE });
    if (!project || !can(viewer, "project:edit", project)) throw new AppError("NOT_FOUND", "No such project.");
    const before = project.declaredValuationCents;
    await project.update({ declaredValuationCents: valuationCents }, { transaction });
    await recordAudit({ viewer, action: "project.valuation-declared", entityType: "project", entityId: projectId, changes: { declaredValuationCents: { before, after: valuationCents } } }, { transaction });
  });
}
