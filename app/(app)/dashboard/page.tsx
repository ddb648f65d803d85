import type { Metadata } from "next";
import { can } from "@/lib/domain/permissions";
import { requireUser } from "@/lib/server/auth";
import { ProjectsTable } from "./_components/projects-table";

export const metadata: Metadata = { title: "Projects" };

export default async function DashboardPage() {
  const viewer = await requireUser();
  return (
    <div className="space-y-4">
      <div>
        <h1>Projects</h1>
        <p className="text-sm text-ink-soft">
          {viewer.role === "installer"
            ? "Projects assigned to you."
            : "Every project of your company, from draft to permission to operate."}
        </p>
      </div>
      <ProjectsTable canCreate={can(viewer, "project:create")} canExport={can(viewer, "reports:view")} />
    </div>
  );
}
