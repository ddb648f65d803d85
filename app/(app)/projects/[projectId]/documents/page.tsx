import type { Metadata } from "next";
import { ProjectSubpageHeader } from "@/components/projects/project-subpage-header";
import { can } from "@/lib/domain/permissions";
import { requireUser } from "@/lib/server/auth";
import { SingleLineSvg } from "@/components/sld/single-line-svg";
import { layoutSingleLine } from "@/lib/sld";
import { getDesignStatus, getEngineDesign } from "@/lib/server/data/designs";
import { listPackets } from "@/lib/server/data/packets";
import { listShareLinks, revisionLabel } from "@/lib/server/data/share-links";
import { listSignatureRequests } from "@/lib/server/data/signature-requests";
import { SIGNED_DOCUMENT_LABELS } from "@/lib/domain/signature-requests";
import { loadProjectOr404 } from "@/lib/server/pages";
import { PacketBoard } from "./_components/packet-board";
import { SharePanel } from "./_components/share-panel";
import { SignaturePanel } from "./_components/signature-panel";
import type { SignableDocument } from "./_components/signature-request-form";
import { requestPacketAction, retryPacketAction } from "./actions";
import { createShareLinkAction, revokeShareLinkAction } from "./share-actions";
import { remindSignerAction, requestSignaturesAction, revokeSignerAction } from "./signature-actions";

export const metadata: Metadata = { title: "Documents" };

export default async function DocumentsPage({ params }: { params: Promise<{ projectId: string }> }) {
  const viewer = await requireUser();
  const project = await loadProjectOr404(viewer, (await params).projectId);
  const [packets, design, engine] = await Promise.all([
    listPackets({ viewer, projectId: project.id }),
    getDesignStatus({ viewer, projectId: project.id }),
    getEngineDesign({ viewer, projectId: project.id }),
  ]);
  const canShare = can(viewer, "project:edit");
  const shareLinks = canShare ? await listShareLinks({ viewer, projectId: project.id }) : [];
  const canAskSignatures = can(viewer, "signatures:request");
  const signatureRequests = canAskSignatures ? await listSignatureRequests({ viewer, projectId: project.id }) : [];
  const signable: SignableDocument[] = [
    ...packets
      .filter((p) => p.kind === "interconnection" && p.status === "ready")
      .map((p) => ({
        value: `packet:${p.id}`,
        kind: "interconnection-application" as const,
        packetId: p.id,
        label: `${SIGNED_DOCUMENT_LABELS["interconnection-application"]} (${revisionLabel(p)})`,
      })),
    { value: "agent-authorization", kind: "agent-authorization", label: SIGNED_DOCUMENT_LABELS["agent-authorization"] },
    ...(engine
      ? [
          {
            value: "completion-certificate",
            kind: "completion-certificate" as const,
            label: SIGNED_DOCUMENT_LABELS["completion-certificate"],
          },
        ]
      : []),
  ];
  const shareable = packets.filter((p) => p.status === "ready").map((p) => ({ packetId: p.id, label: revisionLabel(p) }));
  return (
    <div className="space-y-4">
      <ProjectSubpageHeader project={project} title="Documents">
        Each packet is generated from the saved design and its review; every generation is a new revision with what changed since the last.
      </ProjectSubpageHeader>
      {engine ? (
        <section className="panel space-y-2" aria-labelledby="sld-heading">
          <h2 id="sld-heading">Single-line diagram</h2>
          <p className="text-xs text-ink-faint">Drawn from the saved design; the packets carry the same drawing.</p>
          <div className="overflow-x-auto rounded border border-paper-edge bg-white p-2">
            <SingleLineSvg scene={layoutSingleLine(engine.design, { necEdition: engine.site.necEdition })} className="min-w-[900px]" />
          </div>
        </section>
      ) : null}
      <PacketBoard
        projectId={project.id}
        initial={packets}
        canGenerate={can(viewer, "project:edit")}
        reviewStatus={design?.reviewStatus ?? "incomplete"}
        designRevision={design?.revision ?? null}
        actions={{ request: requestPacketAction, retry: retryPacketAction }}
      />
      {canAskSignatures ? (
        <SignaturePanel
          projectId={project.id}
          documents={signable}
          customer={{ name: project.customerName, email: project.customerEmail ?? "" }}
          requests={signatureRequests}
          actions={{ request: requestSignaturesAction, remind: remindSignerAction, revoke: revokeSignerAction }}
        />
      ) : null}
      {canShare ? (
        <SharePanel
          projectId={project.id}
          revisions={shareable}
          links={shareLinks}
          actions={{ create: createShareLinkAction, revoke: revokeShareLinkAction }}
        />
      ) : null}
    </div>
  );
}
