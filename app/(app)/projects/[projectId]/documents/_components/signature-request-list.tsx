"use client";

import { useState, useTransition } from "react";
import { LocalTime } from "@/components/time/local-time";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import type { SignatureRequestDto, SignatureSignerDto } from "@/lib/dto/signature-requests";
import type { remindSignerAction, revokeSignerAction } from "../signature-actions";

function SignerLine({ signer, busy, act }: { signer: SignatureSignerDto; busy: boolean; act: (kind: "remind" | "revoke") => void }) {
  const waiting = signer.channel === "link" && (signer.state === "sent" || signer.state === "opened");
  return (
    <li className="flex flex-wrap items-start justify-between gap-2 border-t border-paper-edge pt-2" data-testid="signer">
      <div>
        <p>
          <span className="font-medium">{signer.name}</span> <span className="text-ink-faint">· {signer.roleLabel}</span>
          {signer.email ? <span className="text-ink-faint"> · {signer.email}</span> : null}
        </p>
        <p className="text-xs text-ink-faint">
          {signer.answeredAt ? (
            <>
              {signer.stateLabel} <LocalTime iso={signer.answeredAt} />
            </>
          ) : signer.expiresAt ? (
            <>
              Link open until <LocalTime iso={signer.expiresAt} style="date" />
              {signer.openedAt ? (
                <>
                  {" "}
                  · first opened <LocalTime iso={signer.openedAt} />
                </>
              ) : null}
            </>
          ) : null}
          {signer.channel === "in-person" ? " · signed in person" : null}
        </p>
        {signer.state === "declined" ? <p className="text-xs text-ink-soft">Reason: {signer.declineReason}</p> : null}
      </div>
      <div className="flex items-center gap-2">
        <span className="rounded border border-paper-edge px-2 py-0.5 text-xs" data-testid="signer-state">
          {signer.stateLabel}
        </span>
        {waiting || signer.state === "expired" ? (
          <>
            {waiting ? (
              <Button variant="secondary" disabled={busy} onClick={() => act("remind")}>
                Remind
              </Button>
            ) : null}
            <Button variant="danger" disabled={busy} onClick={() => act("revoke")}>
              Withdraw
            </Button>
          </>
        ) : null}
      </div>
    </li>
  );
}

/** The project's signature requests, each signer's state, and the signed copy once there is one. */
export function SignatureRequestList({
  requests,
  onChange,
  remind,
  revoke,
}: {
  requests: SignatureRequestDto[];
  onChange: () => void;
  remind: typeof remindSignerAction;
  revoke: typeof revokeSignerAction;
}) {
  const [message, setMessage] = useState<{ kind: "error" | "info"; text: string }>();
  const [pending, startTransition] = useTransition();
  const act = (signer: SignatureSignerDto, kind: "remind" | "revoke") =>
    startTransition(async () => {
      const result = await (kind === "remind" ? remind : revoke)({ signerId: signer.id });
      setMessage(
        result.ok
          ? {
              kind: "info",
              text: kind === "remind" ? `A new link is queued by e-mail to ${signer.email}.` : `${signer.name}'s link is withdrawn.`,
            }
          : { kind: "error", text: result.message },
      );
      onChange();
    });

  if (requests.length === 0) return <p className="text-sm text-ink-faint">No signature requests yet.</p>;
  return (
    <div className="space-y-3">
      {message ? <FormMessage kind={message.kind}>{message.text}</FormMessage> : null}
      <ul className="space-y-3">
        {requests.map((r) => (
          <li key={r.id} className="rounded border border-paper-edge p-3 text-sm" data-testid="signature-request">
            <div className="flex flex-wrap items-start justify-between gap-2">
              <div>
                <p className="font-medium">{r.title}</p>
                <p className="text-xs text-ink-faint">
                  Asked by {r.createdBy ?? "—"} on <LocalTime iso={r.createdAt} style="date" />
                </p>
              </div>
              <div className="flex flex-wrap gap-3 text-xs">
                <a href={`/api/v1/signature-requests/${r.id}/original`} download>
                  As generated (PDF)
                </a>
                {r.signedAt ? (
                  <a href={`/api/v1/signature-requests/${r.id}/signed`} download data-testid="signed-copy">
                    Signed copy (PDF)
                  </a>
                ) : null}
              </div>
            </div>
            <ul className="mt-2 space-y-2">
              {r.signers.map((s) => (
                <SignerLine key={s.id} signer={s} busy={pending} act={(kind) => act(s, kind)} />
              ))}
            </ul>
          </li>
        ))}
      </ul>
    </div>
  );
}
