import type { Metadata } from "next";
import Link from "next/link";
import { ProjectSubpageHeader } from "@/components/projects/project-subpage-header";
import { can } from "@/lib/domain/permissions";
import { isAppError } from "@/lib/errors";
import { requireUser } from "@/lib/server/auth";
import { getCommissioning } from "@/lib/server/data/commissioning";
import { listProjectFilings } from "@/lib/server/data/filings";
import { FIELD_FILE_KINDS } from "@/lib/field/upload-rules";
import { listProjectFiles } from "@/lib/server/data/project-files";
import { loadProjectOr404 } from "@/lib/server/pages";
import { CommissioningForm } from "./_components/commissioning-form";
import { FieldCautions } from "./_components/field-cautions";
import { FieldInspections } from "./_components/field-inspections";
import { FieldUploads } from "./_components/field-uploads";
import { toFormValues } from "./_components/form-values";
import { checkLiveRecord } from "./_components/live-record";
import { saveCommissioningAction } from "./actions";
import { CertificateSigning } from "./_components/certificate-signing-lazy";
import { signCertificateInPersonAction } from "./signing-actions";
import { ELECTRONIC_SIGNATURE_CONSENT } from "@/lib/documents/signing/consent";
import { listSignatureRequests } from "@/lib/server/data/signature-requests";

export const metadata: Metadata = { title: "Field record" };

async function loadCommissioning(...args: Parameters<typeof getCommissioning>) {
  try {
    return { ok: true as const, data: await getCommissioning(...args) };
  } catch (error) {
    if (isAppError(error) && error.code === "CONFLICT") return { ok: false as const, message: error.message };
    throw error;
  }
}

export default async function FieldPage({ params }: { params: Promise<{ projectId: string }> }) {
  const viewer = await requireUser();
  const project = await loadProjectOr404(viewer, (await params).projectId);
  const [commissioning, files, filings, signatures] = await Promise.all([
    loadCommissioning({ viewer, projectId: project.id }),
    listProjectFiles({ viewer, projectId: project.id }),
    listProjectFilings({ viewer, projectId: project.id }),
    listSignatureRequests({ viewer, projectId: project.id }),
  ]);
  const mayRecord = can(viewer, "field:record", { organizationId: viewer.organizationId, installerId: project.installer?.id ?? null });
  return (
    <div className="mx-auto max-w-3xl space-y-5">
      <ProjectSubpageHeader project={project} title="Field record">
        Commissioning readings checked against the approved design as you type, the certificate of completion to sign, and photos from site.
      </ProjectSubpageHeader>
      <FieldCautions storage={commissioning.ok && Boolean(commissioning.data.facts.storage)} />
      <FieldInspections filings={filings} />
      {commissioning.ok ? (
        <>
          <CommissioningForm
            save={saveCommissioningAction}
            projectId={project.id}
            facts={commissioning.data.facts}
            initialReadings={commissioning.data.readings}
            initialCheck={checkLiveRecord(
              toFormValues(commissioning.data.readings, commissioning.data.facts.acceptedGridProfiles),
              commissioning.data.facts,
            )}
            initialStatus={commissioning.data.status}
            initialUpdatedAt={commissioning.data.updatedAt}
            readOnly={!mayRecord}
          />
          <section className="panel space-y-3" aria-labelledby="documents-heading">
            <h2 id="documents-heading">Certificate and report</h2>
            <p className="text-sm text-ink-soft">
              Both print the readings as last saved. Sign the certificate on this phone below, or print it, sign it on site and upload it.
            </p>
            <div className="flex flex-wrap gap-2">
              <a
                className="rounded border border-paper-edge bg-white px-4 py-2 text-sm no-underline hover:bg-paper-deep hover:no-underline"
                href={`/api/v1/projects/${project.id}/commissioning/certificate`}
                download
              >
                Certificate of completion (PDF)
              </a>
              <a
                className="rounded border border-paper-edge bg-white px-4 py-2 text-sm no-underline hover:bg-paper-deep hover:no-underline"
                href={`/api/v1/projects/${project.id}/commissioning/report`}
                download
              >
                Commissioning report (PDF)
              </a>
            </div>
          </section>
          {mayRecord ? (
            <CertificateSigning
              projectId={project.id}
              installerName={project.installer?.name ?? viewer.name}
              customerName={project.customerName}
              consent={ELECTRONIC_SIGNATURE_CONSENT}
              signed={signatures
                .filter((r) => r.documentKind === "completion-certificate" && r.signedAt)
                .map((r) => ({
                  requestId: r.id,
                  signedAt: r.signedAt!,
                  signers: r.signers
                    .filter((s) => s.state === "signed")
                    .map((s) => s.name)
                    .join(" and "),
                }))}
              sign={signCertificateInPersonAction}
            />
          ) : null}
        </>
      ) : (
        <p className="panel text-sm text-ink-soft" data-testid="no-design">
          {commissioning.message} <Link href={`/projects/${project.id}/design`}>Open the design</Link>
        </p>
      )}
      <FieldUploads projectId={project.id} initialFiles={files.filter((f) => FIELD_FILE_KINDS.includes(f.kind))} mayUpload={mayRecord} />
    </div>
  );
}
