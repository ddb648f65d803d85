"use client";

import { useCallback, useState, useTransition } from "react";
import { useRouter } from "next/navigation";
import { SignatureInput } from "@/components/signing/signature-input";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import type { SigningView } from "@/lib/dto/signature-requests";
import { formatInZone } from "@/lib/domain/time-zones";
import type { SignatureMarkInput } from "@/lib/schemas/signature-request";
import type { declineSigningAction, signDocumentAction } from "../actions";

type Actions = { sign: typeof signDocumentAction; decline: typeof declineSigningAction };

function Pages({ token, count }: { token: string; count: number }) {
  return (
    <section className="space-y-3" aria-label="The document">
      {Array.from({ length: count }, (_, i) => (
        // eslint-disable-next-line @next/next/no-img-element -- pages are drawn by the server per link; the image optimizer must not cache them
        <img
          key={i}
          src={`/sign/${encodeURIComponent(token)}/pages/${i + 1}`}
          alt={`Page ${i + 1} of ${count}`}
          loading={i < 2 ? "eager" : "lazy"}
          className="w-full rounded border border-paper-edge bg-white shadow-sm"
          data-testid="document-page"
        />
      ))}
    </section>
  );
}

/** The signer's page: the document's pages, then their name, the agreement, the signature, or a refusal. */
export function SigningPage({ token, view, consent, actions }: { token: string; view: SigningView; consent: string; actions: Actions }) {
  const router = useRouter();
  const [name, setName] = useState("");
  const [agreedAt, setAgreedAt] = useState<string | null>(null);
  const [mark, setMark] = useState<SignatureMarkInput | null>(null);
  const [declining, setDeclining] = useState(false);
  const [reason, setReason] = useState("");
  const [errors, setErrors] = useState<Record<string, string[]>>({});
  const [message, setMessage] = useState<string>();
  const [pending, startTransition] = useTransition();
  const onMark = useCallback((m: SignatureMarkInput | null) => setMark(m), []);
  const download = `/sign/${encodeURIComponent(token)}/document`;
  const when = (iso: string) => formatInZone(iso, view.timeZone, "datetime");

  if (view.state !== "open")
    return (
      <div className="space-y-4">
        <div className="panel space-y-2" data-testid="signing-answered">
          <h1 className="text-xl">{view.state === "signed" ? "Already signed" : "You declined to sign"}</h1>
          <p className="text-sm text-ink-soft">
            {view.state === "signed"
              ? `${view.signerName} signed the ${view.documentTitle.toLowerCase()} on ${when(view.signedAt!)}. The signed copy ends with its signing record.`
              : `Your reason was sent to ${view.organizationName}: ${view.declineReason}`}
          </p>
          {view.state === "signed" ? (
            <a className="inline-block rounded bg-copper px-4 py-2 text-sm text-white no-underline" href={download} download>
              Download the signed copy (PDF)
            </a>
          ) : null}
        </div>
        <Pages token={token} count={view.pageCount} />
      </div>
    );

  const answer = (event: React.FormEvent) => {
    event.preventDefault();
    startTransition(async () => {
      const result = declining
        ? await actions.decline({ token, reason })
        : await actions.sign({ token, name, agreed: (agreedAt !== null) as true, mark: mark!, consentedAt: agreedAt ?? undefined });
      if (!result.ok) {
        setErrors(result.fieldErrors ?? {});
        setMessage(result.message);
        return;
      }
      router.refresh();
    });
  };

  return (
    <div className="space-y-4">
      <div className="space-y-1">
        <h1 className="text-xl sm:text-2xl">{view.documentTitle}</h1>
        <p className="text-sm text-ink-soft">
          {view.organizationName} asks {view.signerName} ({view.roleLabel.toLowerCase()}) to sign this document for the solar PV system at{" "}
          {view.siteAddress}. Read every page, then sign below. {view.expiresAt ? `The link works until ${when(view.expiresAt)}.` : ""}
        </p>
        <a className="text-sm" href={download} download>
          Download the document (PDF)
        </a>
      </div>
      <Pages token={token} count={view.pageCount} />
      <form className="panel space-y-4" onSubmit={answer} noValidate data-testid="signing-form">
        {declining ? (
          <div className="space-y-2">
            <h2>Decline to sign</h2>
            <label className="label" htmlFor="decline-reason">
              Tell {view.organizationName} why
            </label>
            <textarea
              id="decline-reason"
              className="input"
              rows={3}
              maxLength={1000}
              value={reason}
              onChange={(e) => setReason(e.target.value)}
            />
            {errors.reason ? <p className="text-sm text-result-fail">{errors.reason[0]}</p> : null}
          </div>
        ) : (
          <>
            <h2>Sign</h2>
            <div className="space-y-1">
              <label className="label" htmlFor="signer-name">
                Your full name
              </label>
              <input id="signer-name" className="input" autoComplete="name" value={name} onChange={(e) => setName(e.target.value)} />
              <p className="text-xs text-ink-faint">Type it as {view.signerName}; it confirms who signs.</p>
              {errors.name ? <p className="text-sm text-result-fail">{errors.name[0]}</p> : null}
            </div>
            <div className="space-y-1 rounded border border-copper/40 bg-paper-deep p-3">
              <p className="text-sm" id="consent-text">
                {consent}
              </p>
              <label className="flex items-start gap-2 text-sm font-medium">
                <input
                  type="checkbox"
                  aria-describedby="consent-text"
                  checked={agreedAt !== null}
                  onChange={(e) => setAgreedAt(e.target.checked ? new Date().toISOString() : null)}
                />
                I agree to sign electronically
              </label>
              {errors.agreed ? <p className="text-sm text-result-fail">{errors.agreed[0]}</p> : null}
            </div>
            <SignatureInput idPrefix="signer" expectedName={view.signerName} onChange={onMark} />
            {errors["mark.png"] || errors["mark.name"] || errors.mark ? (
              <p className="text-sm text-result-fail">{(errors["mark.png"] ?? errors["mark.name"] ?? errors.mark)![0]}</p>
            ) : null}
          </>
        )}
        <FormMessage kind="error">{message}</FormMessage>
        <div className="flex flex-wrap gap-2">
          {declining ? (
            <>
              <Button type="submit" variant="danger" disabled={pending || !reason.trim()}>
                {pending ? "Sending…" : "Decline to sign"}
              </Button>
              <Button type="button" variant="secondary" onClick={() => setDeclining(false)}>
                Back to signing
              </Button>
            </>
          ) : (
            <>
              <Button type="submit" disabled={pending || !mark || agreedAt === null || !name.trim()}>
                {pending ? "Signing…" : "Sign the document"}
              </Button>
              <Button type="button" variant="secondary" onClick={() => setDeclining(true)}>
                I do not want to sign
              </Button>
            </>
          )}
        </div>
      </form>
    </div>
  );
}
