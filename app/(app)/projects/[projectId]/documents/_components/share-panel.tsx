"use client";

import { useRouter } from "next/navigation";
import type { ShareLinkDto } from "@/lib/dto/share-links";
import { ShareLinkForm, type ShareableRevision } from "./share-link-form";
import { ShareLinkList } from "./share-link-list";
import type { createShareLinkAction, revokeShareLinkAction } from "../share-actions";

/** Coordinators hand chosen revisions to an AHJ inspector through a read-only link. */
/** The page hands down the two share actions. */
export type ShareActions = { create: typeof createShareLinkAction; revoke: typeof revokeShareLinkAction };

export function SharePanel({
  projectId,
  revisions,
  links,
  actions,
}: {
  projectId: string;
  revisions: ShareableRevision[];
  links: ShareLinkDto[];
  actions: ShareActions;
}) {
  const router = useRouter();
  const refresh = () => router.refresh();
  return (
    <section className="panel space-y-4" aria-labelledby="share-heading" data-testid="share-panel">
      <div>
        <h2 id="share-heading">Share with an inspector</h2>
        <p className="text-sm text-ink-soft">
          The inspector gets a read-only page with the project summary, the single-line diagram and the chosen PDFs, without an account.
          Every view and download is logged below.
        </p>
      </div>
      <ShareLinkForm projectId={projectId} revisions={revisions} onCreated={refresh} create={actions.create} />
      <h3 className="text-sm font-semibold">Links</h3>
      <ShareLinkList links={links} onChange={refresh} revokeLink={actions.revoke} />
    </section>
  );
}
