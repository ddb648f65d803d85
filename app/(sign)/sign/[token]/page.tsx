import type { Metadata } from "next";
import { headers } from "next/headers";
import { notFound, redirect } from "next/navigation";
import { ELECTRONIC_SIGNATURE_CONSENT } from "@/lib/documents/signing/consent";
import type { SigningView } from "@/lib/dto/signature-requests";
import { isAppError } from "@/lib/errors";
import { clientOf } from "@/lib/server/share-http";
import { openSigningLink } from "@/lib/server/use-cases/signatures";
import { SigningPage } from "./_components/signing-page";
import { declineSigningAction, signDocumentAction } from "./actions";

export const metadata: Metadata = { title: "Sign a document", robots: { index: false, follow: false, nocache: true } };

// The signer's page: the token is the only key, there is no session.
export default async function SignDocumentPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  let view: SigningView;
  try {
    view = await openSigningLink(token, clientOf(await headers()));
  } catch (error) {
    if (!isAppError(error)) throw error;
    if (error.code === "NOT_FOUND") notFound();
    // Pages cannot answer 410 or 429 themselves; this route handler does, with the reason.
    redirect(`/sign/${encodeURIComponent(token)}/gone`);
  }
  return (
    <SigningPage
      token={token}
      view={view}
      consent={ELECTRONIC_SIGNATURE_CONSENT}
      actions={{ sign: signDocumentAction, decline: declineSigningAction }}
    />
  );
}
