import "server-only";
import { Payment, PaymentLine, Project, Refund, User } from "@/models";
import { can, type Viewer } from "@/lib/domain/permissions";
import { localIsoDate } from "@/lib/domain/time-zones";
import { AppError } from "@/lib/errors";
import { computeFees, feeNameKey, returnedFeeKeys, type PaidPayment } from "@/lib/fees";
import type { PaymentStatus } from "@/lib/domain/stored-values";
import { db } from "../db";
import { getProjectById } from "./projects";
import { getReviewedDesign } from "./reviewed-design";
import type { ProjectDto } from "@/lib/dto/projects";
import { recordAudit } from "./audit";
import { schedulesForProject } from "./fee-schedules";
import { getOrganization } from "./organizations";
import type { FeeLineState, ProjectFeeLineDto, PaymentDto, ProjectFeesDto } from "@/lib/dto/fees";

/** Paid lines stay paid whatever the design does later; lines a refund gave back are owed again. */
const HOLDS_LINES: PaymentStatus[] = ["pending", "paid", "partially_refunded"];

export const feeKeyOf = (kind: string, authorityId: string, name: string) => `${kind}:${authorityId}:${feeNameKey(name)}`;

/** A payment's lines and standing refunds, as the refund rule reads them. */
export function paidPaymentOf(p: Payment): PaidPayment {
  return {
    amountCents: p.amountCents,
    lines: (p.lines ?? []).map((l) => ({ feeKey: l.feeKey, name: l.name, amountCents: l.amountCents })),
    refunds: (p.refunds ?? []).filter((r) => r.status !== "failed").map((r) => ({ amountCents: r.amountCents, feeKeys: r.feeKeys })),
  };
}

const MONEY_HELD: PaymentStatus[] = ["paid", "partially_refunded", "refunded"];

export function toPaymentDto(p: Payment, { failureStillOpen = false }: { failureStillOpen?: boolean } = {}): PaymentDto {
  const returned = MONEY_HELD.includes(p.status) ? returnedFeeKeys(paidPaymentOf(p)) : new Set<string>();
  const nameOf = new Map((p.lines ?? []).map((l) => [l.feeKey, l.name]));
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
    lines: (p.lines ?? []).map((l) => ({
      feeKey: l.feeKey,
      name: l.name,
      authority: l.authority,
      amountCents: l.amountCents,
      refunded: returned.has(l.feeKey),
    })),
    refunds: (p.refunds ?? []).map((r) => ({
      id: r.id,
      amountCents: r.amountCents,
      lineNames: r.feeKeys.map((k) => nameOf.get(k)).filter((n): n is string => Boolean(n)),
      reason: r.reason,
      createdAt: r.createdAt.toISOString(),
      createdBy: r.createdBy?.name ?? null,
      failed: r.status === "failed",
    })),
    failureStillOpen: Boolean(p.failureMessage) && failureStillOpen,
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
  const project = await getProjectById({ viewer, projectId });
  return feesForProject({ viewer, project, sizes: await designSizes({ viewer, project }) });
}

export type DesignSizes = ProjectFeesDto["sizes"];

/** The ratings fees are priced from: the reviewed design's DC and AC size, null while the design cannot be reviewed. */
export async function designSizes({ viewer, project }: { viewer: Viewer; project: ProjectDto }): Promise<DesignSizes> {
  const snapshot = await getReviewedDesign({ viewer, projectId: project.id, project });
  return snapshot.status === "reviewed"
    ? { dcKw: snapshot.reviewed.review.summary.ratings.dcKw, acKw: snapshot.reviewed.review.summary.ratings.acKw }
    : null;
}

/** The fees of a project already read, priced from sizes already worked out: what changes between two looks is only the payments. */
export async function feesForProject({
  viewer,
  project,
  sizes,
}: {
  viewer: Viewer;
  project: ProjectDto;
  sizes: DesignSizes;
}): Promise<ProjectFeesDto> {
  db();
  const projectId = project.id;
  const valuationCents = project.declaredValuationCents;
  const asOf = localIsoDate(new Date().toISOString(), (await getOrganization({ viewer })).timeZone);

  const schedules = await schedulesForProject(viewer, project);
  const payments = await Payment.findAll({
    where: { projectId, organizationId: viewer.organizationId },
    include: PAYMENT_INCLUDE,
    order: [["createdAt", "DESC"]],
  });
  // Which payment holds each line (a paid one before a pending one), and which lines refunds gave back.
  const holding = new Map<string, Payment>();
  const refundedBy = new Map<string, Payment>();
  for (const p of payments) {
    const returned = MONEY_HELD.includes(p.status) ? returnedFeeKeys(paidPaymentOf(p)) : new Set<string>();
    for (const l of p.lines ?? []) {
      if (returned.has(l.feeKey)) {
        if (!refundedBy.has(l.feeKey)) refundedBy.set(l.feeKey, p);
      } else if (
        HOLDS_LINES.includes(p.status) &&
        (!holding.has(l.feeKey) || (holding.get(l.feeKey)!.status === "pending" && p.status !== "pending"))
      ) {
        holding.set(l.feeKey, p);
      }
    }
  }

  const lines: ProjectFeeLineDto[] = [];
  for (const schedule of schedules) {
    const computed = computeFees({
      lines: schedule.lines.map((l) => ({ ...l, authority: schedule.name })),
      facts: { dcKw: sizes?.dcKw ?? null, acKw: sizes?.acKw ?? null, valuationCents, asOf },
    });
    for (const line of computed.lines) {
      const feeKey = feeKeyOf(schedule.kind, schedule.id, line.name);
      const payment = holding.get(feeKey) ?? null;
      const paidLine = payment && payment.status !== "pending" ? payment.lines!.find((l) => l.feeKey === feeKey)! : null;
      // A declined card leaves its checkout open but the fee unpaid; paying again replaces that checkout.
      const state: FeeLineState = paidLine
        ? "paid"
        : payment && !payment.failureMessage
          ? "in-progress"
          : refundedBy.has(feeKey)
            ? "refunded"
            : "unpaid";
      const problem = paidLine ? null : (line.problem ?? null);
      const amountCents = paidLine ? paidLine.amountCents : line.amountCents;
      lines.push({
        feeKey,
        authority: schedule.name,
        authorityKind: schedule.kind,
        name: line.name,
        arithmetic: paidLine ? paidLine.arithmetic : line.arithmetic,
        amountCents,
        problem: problem?.message ?? null,
        problemCode: problem?.code ?? null,
        state,
        payable: state !== "paid" && !problem && amountCents > 0,
        paymentId: payment?.id ?? refundedBy.get(feeKey)?.id ?? null,
      });
    }
  }
  const owed = lines.filter((l) => l.state === "unpaid" || l.state === "refunded");
  const unpaidTotalCents = owed.reduce((sum, l) => sum + l.amountCents, 0);
  const stateOf = new Map(lines.map((l) => [l.feeKey, l.state]));
  // A failed attempt matters while one of its fees is still owed and no other checkout is under way for it.
  const failureStillOpen = (p: Payment) =>
    !MONEY_HELD.includes(p.status) &&
    (p.lines ?? []).some((l) => stateOf.get(l.feeKey) === "unpaid" || stateOf.get(l.feeKey) === "refunded");
  return {
    asOf,
    sizes,
    valuationCents,
    lines,
    unpaidTotalCents,
    unpaidIsAtLeast: owed.some((l) => l.problem !== null),
    payments: payments.map((p) => toPaymentDto(p, { failureStillOpen: failureStillOpen(p) })),
  };
}

/** The valuation the owner declared for the work; fees that are a percentage of it follow. */
export async function setDeclaredValuation({
  viewer,
  projectId,
  valuationCents,
}: {
  viewer: Viewer;
  projectId: string;
  valuationCents: number | null;
}) {
  const sequelize = db();
  await sequelize.transaction(async (transaction) => {
    const project = await Project.findOne({
      where: { id: projectId, organizationId: viewer.organizationId },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!project || !can(viewer, "project:edit", project)) throw new AppError("NOT_FOUND", "No such project.");
    const before = project.declaredValuationCents;
    await project.update({ declaredValuationCents: valuationCents }, { transaction });
    await recordAudit(
      {
        viewer,
        action: "project.valuation-declared",
        entityType: "project",
        entityId: projectId,
        changes: { declaredValuationCents: { before, after: valuationCents } },
      },
      { transaction },
    );
  });
}
