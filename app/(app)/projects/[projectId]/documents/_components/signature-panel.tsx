"use client";

import { useRouter } from "next/navigation";
import type { SignatureRequestDto } from "@/lib/dto/signature-requests";
import type { remindSignerAction, requestSignaturesAction, revokeSignerAction } from "../signature-actions";
import { SignatureRequestForm, type SignableDocument } from "./signature-request-form";
import { SignatureRequestList } from "./signature-request-list";

/** The page hands down the three signature actions. */
export type SignatureActions = {
  request: typeof requestSignaturesAction;
  remind: typeof remindSignerAction;
  revoke: typeof revokeSignerAction;
};

/** Coordinators ask the customer (and a second owner) to sign a generated document through a link of their own. */
export function SignaturePanel({
  projectId,
  documents,
  customer,
  requests,
  actions,
}: {
  projectId: string;
  documents: SignableDocument[];
  customer: { name: string; email: string };
  requests: SignatureRequestDto[];
  actions: SignatureActions;
}) {
  const router = useRouter();
  const refresh = () => router.refresh();
  return (
    <section className="panel space-y-4" aria-labelledby="signatures-heading" data-testid="signature-panel">
      <div>
        <h2 id="signatures-heading">Signatures</h2>
        <p className="text-sm text-ink-soft">
          Each signer gets a link of their own by e-mail: they read the document on their phone or computer and sign by drawing or typing
          their name, or decline with a reason. The signed copy gets a signing record page; the document as generated stays as it was.
        </p>
      </div>
      <SignatureRequestForm projectId={projectId} documents={documents} customer={customer} onCreated={refresh} request={actions.request} />
      <h3 className="text-sm font-semibold">Requests</h3>
      <SignatureRequestList requests={requests} onChange={refresh} remind={actions.remind} revoke={actions.revoke} />
    </section>
  );
}
