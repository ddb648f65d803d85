import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { can } from "@/lib/domain/permissions";
import { requireUser } from "@/lib/server/auth";
import { loadProjectOr404 } from "@/lib/server/pages";
import { getProjectFormOptions } from "@/lib/server/data/reference-data";
import { ProjectForm } from "../../_components/project-form";
import { updateProjectAction } from "../../actions";

export const metadata: Metadata = { title: "Edit project" };

export default async function EditProjectPage({ params }: { params: Promise<{ projectId: string }> }) {
  const viewer = await requireUser();
  const project = await loadProjectOr404(viewer, (await params).projectId);
  if (!can(viewer, "project:edit")) notFound();
  const options = await getProjectFormOptions({ viewer });
  const s = (v: string | number | null) => (v === null ? "" : String(v));
  const initial = {
    customerName: project.customerName,
    customerEmail: s(project.customerEmail),
    customerPhone: s(project.customerPhone),
    street: project.street,
    city: project.city,
    state: project.state,
    postalCode: project.postalCode,
    jurisdictionId: project.jurisdiction?.id ?? "",
    utilityId: project.utility?.id ?? "",
    utilityAccountNumber: s(project.utilityAccountNumber),
    meterNumber: s(project.meterNumber),
    mainBreakerA: s(project.mainBreakerA),
    busbarA: s(project.busbarA),
    serviceVoltageV: s(project.serviceVoltageV),
    servicePhases: s(project.servicePhases) as "" | "1" | "3",
    coordinatorId: project.coordinator?.id ?? "",
    installerId: project.installer?.id ?? "",
  };
  return (
    <div className="mx-auto max-w-3xl space-y-4">
      <h1>
        Edit project <span className="measure text-ink-faint">No. {project.number}</span>
      </h1>
      <ProjectForm save={{ update: updateProjectAction, projectId: project.id }} initial={initial} options={options} />
    </div>
  );
}
