import type { Metadata } from "next";
import { ProjectSubpageHeader } from "@/components/projects/project-subpage-header";
import { can } from "@/lib/domain/permissions";
import { feeTotalText } from "@/lib/fees";
import { requireUser } from "@/lib/server/auth";
import { getProjectFees } from "@/lib/server/data/project-fees";
import { loadProjectOr404 } from "@/lib/server/pages";
import { FeeLines } from "./_components/fee-lines";
import { PaymentHistory } from "./_components/payment-history";
import { ValuationForm } from "./_components/valuation-form";
import { payFeesAction, refundPaymentAction, setValuationAction } from "./actions";

export const metadata: Metadata = { title: "Fees" };

export default async function FeesPage({
  params,
  searchParams,
}: {
  params: Promise<{ projectId: string }>;
  searchParams: Promise<{ checkout?: string }>;
}) {
  const viewer = await requireUser();
  const project = await loadProjectOr404(viewer, (await params).projectId);
  const [fees, { checkout }] = await Promise.all([getProjectFees({ viewer, projectId: project.id }), searchParams]);
  const pending = fees.payments.some((p) => p.status === "pending");
  return (
    <div className="space-y-5">
      <ProjectSubpageHeader project={project} title="Fees">
        Permit and interconnection fees from the AHJ&apos;s and the utility&apos;s schedules, worked out from the reviewed design
        {fees.sizes ? ` (${fees.sizes.dcKw} kW DC, ${fees.sizes.acKw} kW AC)` : ""} and the declared valuation, as of {fees.asOf}. Unpaid
        fees follow the design until they are paid.
      </ProjectSubpageHeader>
      {checkout === "done" ? (
        <p role="status" className="panel text-sm" data-testid="checkout-returned">
          {pending
            ? "Payment submitted. Waiting for the payment service to confirm it…"
            : "Payment confirmed. The receipt is on its way by e-mail."}
        </p>
      ) : checkout === "cancelled" ? (
        <p role="status" className="panel text-sm" data-testid="checkout-returned">
          Payment not completed. Nothing was charged for the fees still marked unpaid.
        </p>
      ) : null}
      <ValuationForm
        setValuation={setValuationAction}
        projectId={project.id}
        valuationCents={fees.valuationCents}
        canEdit={can(viewer, "project:edit")}
      />
      <FeeLines payFees={payFeesAction} projectId={project.id} lines={fees.lines} canPay={can(viewer, "fees:pay")} watchPending={pending} />
      <p className="text-sm text-ink-soft">
        Unpaid:{" "}
        <strong className="measure" data-testid="unpaid-total">
          {feeTotalText({ totalCents: fees.unpaidTotalCents, isComplete: !fees.unpaidIsAtLeast })}
        </strong>
        {fees.unpaidIsAtLeast ? " (a fee still waits for the valuation or the design)" : ""}. Fee schedules change: confirm the amounts with
        the AHJ and the utility before filing.
      </p>
      <PaymentHistory payments={fees.payments} refund={refundPaymentAction} canRefund={can(viewer, "fees:refund")} />
    </div>
  );
}
