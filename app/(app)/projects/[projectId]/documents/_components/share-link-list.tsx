"use client";

import { useState, useTransition } from "react";
import { LocalTime } from "@/components/time/local-time";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import type { ShareLinkDto, ShareLinkStatus } from "@/lib/dto/share-links";
import type { revokeShareLinkAction } from "../share-actions";

const STATUS_WORDS: Record<ShareLinkStatus, string> = { active: "Active", expired: "Expired", revoked: "Revoked" };
const when = (iso: string) => <LocalTime iso={iso} />;

/** The project's links with their state and who opened them. */
export function ShareLinkList({
  links,
  onChange,
  revokeLink,
}: {
  links: ShareLinkDto[];
  onChange: () => void;
  revokeLink: typeof revokeShareLinkAction;
}) {
  const [message, setMessage] = useState<string>();
  const [pending, startTransition] = useTransition();
  const revoke = (shareLinkId: string) =>
    startTransition(async () => {
      const result = await revokeLink({ shareLinkId });
      setMessage(result.ok ? undefined : result.message);
      onChange();
    });

  if (links.length === 0) return <p className="text-sm text-ink-faint">No links yet.</p>;
  return (
    <div className="space-y-3">
      <FormMessage kind="error">{message}</FormMessage>
      <ul className="space-y-3">
        {links.map((link) => (
          <li key={link.id} className="rounded border border-paper-edge p-3 text-sm" data-testid="share-link">
            <div className="flex flex-wrap items-start justify-between gap-2">
              <div>
                <p className="font-medium">{link.recipientEmail ?? "No recipient (link copied by hand)"}</p>
                <p className="text-xs text-ink-faint">
                  {link.revisions.map((r) => r.label).join(", ")} · made by {link.createdBy ?? "—"} on{" "}
                  <LocalTime iso={link.createdAt} style="date" /> · expires <LocalTime iso={link.expiresAt} style="date" />
                </p>
                {link.note ? <p className="text-xs text-ink-soft">Note: {link.note}</p> : null}
              </div>
              <div className="flex items-center gap-2">
                <span className="rounded border border-paper-edge px-2 py-0.5 text-xs" data-testid="share-link-status">
                  {STATUS_WORDS[link.status]}
                </span>
                {link.status === "active" ? (
                  <Button variant="danger" disabled={pending} onClick={() => revoke(link.id)}>
                    Revoke
                  </Button>
                ) : null}
              </div>
            </div>
            <details className="mt-2">
              <summary className="cursor-pointer text-xs">Access log ({link.accesses.length})</summary>
              {link.accesses.length === 0 ? (
                <p className="mt-1 text-xs text-ink-faint">Not opened yet.</p>
              ) : (
                <table className="mt-1 w-full text-left text-xs" data-testid="share-link-accesses">
                  <thead>
                    <tr className="text-ink-faint">
                      <th className="py-1 pr-2 font-normal">Time</th>
                      <th className="py-1 pr-2 font-normal">What</th>
                      <th className="py-1 pr-2 font-normal">Address</th>
                      <th className="py-1 font-normal">Browser</th>
                    </tr>
                  </thead>
                  <tbody>
                    {link.accesses.map((a, i) => (
                      <tr key={i} className="border-t border-paper-edge align-top">
                        <td className="measure py-1 pr-2 whitespace-nowrap">{when(a.at)}</td>
                        <td className="py-1 pr-2">{a.kind === "view" ? "Viewed the page" : `Downloaded ${a.revision ?? "a revision"}`}</td>
                        <td className="measure py-1 pr-2">{a.address}</td>
                        <td className="max-w-xs truncate py-1" title={a.userAgent}>
                          {a.userAgent || "—"}
                        </td>
                      </tr>
                    ))}
                  </tbody>
                </table>
              )}
            </details>
          </li>
        ))}
      </ul>
    </div>
  );
}
