"use server";

import { revalidatePath } from "next/cache";
import { defineAction } from "@/lib/server/action";
import { refundPayment, startPayment } from "@/lib/server/use-cases/payments";
import { setDeclaredValuation } from "@/lib/server/data/project-fees";
import { PayFeesInput, RefundInput, ValuationInput } from "@/lib/schemas/payment";

export const payFeesAction = defineAction({ schema: PayFeesInput, permission: "fees:pay" }, async ({ projectId, feeKeys }, { viewer }) =>
  startPayment({ viewer, projectId, feeKeys }),
);

export const refundPaymentAction = defineAction(
  { schema: RefundInput, permission: "fees:refund" },
  async ({ paymentId, feeKeys, amount, reason }, { viewer }) => {
    const payment = await refundPayment({ viewer, paymentId, reason, ...(feeKeys?.length ? { feeKeys } : { amountCents: amount! }) });
    return { status: payment.status, refundedCents: payment.refundedCents };
  },
);

export const setValuationAction = defineAction(
  { schema: ValuationInput, permission: "project:edit" },
  async ({ projectId, valuation }, { viewer }) => {
    await setDeclaredValuation({ viewer, projectId, valuationCents: valuation });
    revalidatePath(`/projects/${projectId}/fees`);
    return { valuationCents: valuation };
  },
);
