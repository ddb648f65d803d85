"use client";

import { useCallback, useState, useTransition } from "react";
import { useRouter } from "next/navigation";
import { SignatureInput } from "@/components/signing/signature-input";
import { LocalTime } from "@/components/time/local-time";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import type { SignatureMarkInput } from "@/lib/schemas/signature-request";
import type { signCertificateInPersonAction } from "../signing-actions";

type Signer = { name: string; agreedAt: string | null; mark: SignatureMarkInput | null };
export type SignedCertificate = { requestId: string; signedAt: string; signers: string };

function SignerBlock({
  idPrefix,
  title,
  consent,
  signer,
  onChange,
  error,
}: {
  idPrefix: string;
  title: string;
  consent: string;
  signer: Signer;
  onChange: (s: Signer) => void;
  error?: string;
}) {
  const onMark = useCallback((mark: SignatureMarkInput | null) => onChange({ ...signer, mark }), [onChange, signer]);
  return (
    <fieldset className="space-y-2 rounded border border-paper-edge p-3" data-testid={`${idPrefix}-block`}>
      <legend className="px-1 text-sm font-semibold">{title}</legend>
      <label className="label" htmlFor={`${idPrefix}-name`}>
        {title}: full name
      </label>
      <input
        id={`${idPrefix}-name`}
        className="input"
        value={signer.name}
        onChange={(e) => onChange({ ...signer, name: e.target.value })}
      />
      <p className="text-sm">{consent}</p>
      <label className="flex items-start gap-2 text-sm font-medium">
        <input
          type="checkbox"
          checked={signer.agreedAt !== null}
          onChange={(e) => onChange({ ...signer, agreedAt: e.target.checked ? new Date().toISOString() : null })}
        />
        {`${title}: I agree to sign electronically`}
      </label>
      <SignatureInput idPrefix={idPrefix} expectedName={signer.name || title} onChange={onMark} />
      {error ? <p className="text-sm text-result-fail">{error}</p> : null}
    </fieldset>
  );
}

/**
 * The installer and the customer sign the certificate of completion on this phone, one after the other;
 * the signed copy gets the same signing record as a link signature. Printing and uploading stays possible.
 */
export function CertificateSigning({
  projectId,
  installerName,
  customerName,
  consent,
  signed,
  sign,
}: {
  projectId: string;
  installerName: string;
  customerName: string;
  consent: string;
  signed: SignedCertificate[];
  sign: typeof signCertificateInPersonAction;
}) {
  const router = useRouter();
  const [installer, setInstaller] = useState<Signer>({ name: installerName, agreedAt: null, mark: null });
  const [customer, setCustomer] = useState<Signer>({ name: customerName, agreedAt: null, mark: null });
  const [email, setEmail] = useState("");
  const [errors, setErrors] = useState<Record<string, string[]>>({});
  const [message, setMessage] = useState<string>();
  const [pending, startTransition] = useTransition();
  const ready = [installer, customer].every((s) => s.name.trim() && s.agreedAt && s.mark);
  const firstError = (prefix: string) => Object.entries(errors).find(([k]) => k.startsWith(prefix))?.[1][0];

  const submit = (event: React.FormEvent) => {
    event.preventDefault();
    startTransition(async () => {
      const person = (s: Signer) => ({ name: s.name, agreed: true as const, consentedAt: s.agreedAt!, mark: s.mark! });
      const result = await sign({ projectId, installer: person(installer), customer: { ...person(customer), email } });
      if (!result.ok) {
        setErrors(result.fieldErrors ?? {});
        setMessage(result.message);
        return;
      }
      setErrors({});
      setMessage(undefined);
      router.refresh();
    });
  };

  return (
    <section className="panel space-y-3" aria-labelledby="phone-signing-heading" data-testid="certificate-signing">
      <h2 id="phone-signing-heading">Sign the certificate on this phone</h2>
      <p className="text-sm text-ink-soft">
        The installer signs, then hands the phone to the customer. The certificate prints the readings as last saved; the signed copy ends
        with a signing record page.
      </p>
      {signed.length ? (
        <ul className="space-y-1 text-sm" data-testid="signed-certificates">
          {signed.map((c) => (
            <li key={c.requestId}>
              Signed by {c.signers} on <LocalTime iso={c.signedAt} />:{" "}
              <a href={`/api/v1/signature-requests/${c.requestId}/signed`} download>
                signed certificate (PDF)
              </a>
            </li>
          ))}
        </ul>
      ) : null}
      <form className="space-y-3" onSubmit={submit} noValidate>
        <SignerBlock
          idPrefix="installer"
          title="Installer"
          consent={consent}
          signer={installer}
          onChange={setInstaller}
          error={firstError("installer")}
        />
        <SignerBlock
          idPrefix="customer"
          title="Customer"
          consent={consent}
          signer={customer}
          onChange={setCustomer}
          error={firstError("customer")}
        />
        <div className="space-y-1">
          <label className="label" htmlFor="customer-email">
            Customer&apos;s e-mail for the signed copy (optional)
          </label>
          <input id="customer-email" className="input" type="email" value={email} onChange={(e) => setEmail(e.target.value)} />
        </div>
        <FormMessage kind="error">{message}</FormMessage>
        <Button type="submit" disabled={pending || !ready}>
          {pending ? "Signing…" : "Sign the certificate"}
        </Button>
      </form>
    </section>
  );
}
