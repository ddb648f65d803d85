import type { Metadata } from "next";
import { deskSectionOf } from "@/lib/domain/desk";
import { can } from "@/lib/domain/permissions";
import { requireUser } from "@/lib/server/auth";
import { getDesk } from "@/lib/server/data/desk";
import { listProjects } from "@/lib/server/data/projects";
import { FIRST_LIST_PAGE, ProjectListQuery } from "@/lib/schemas/project";
import { ProjectsTable } from "./_components/projects-table";
import { TodayDesk } from "./_components/today-desk";

export const metadata: Metadata = { title: "Projects" };

export default async function DashboardPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const viewer = await requireUser();
  const expanded = deskSectionOf((await searchParams).desk);
  // The office starts its day with what to chase; the crew's list is its projects.
  const [today, firstPage] = await Promise.all([
    can(viewer, "desk:view") ? getDesk({ viewer }) : null,
    listProjects({ viewer, query: ProjectListQuery.parse(FIRST_LIST_PAGE) }),
  ]);
  return (
    <div className="space-y-6">
      {today ? (
        <TodayDesk
          desk={today.desk}
          today={today.today}
          expanded={expanded}
          scope={viewer.role === "admin" ? "Every active project of the company." : "The active projects you coordinate."}
        />
      ) : null}
      <div className="space-y-4">
        <div>
          {/* With the desk above, the day is the page's title and the list its second part. */}
          {today ? <h2 className="text-lg">All projects</h2> : <h1>Projects</h1>}
          <p className="text-sm text-ink-soft">
            {viewer.role === "installer"
              ? "Projects assigned to you."
              : "Every project of your company, from draft to permission to operate."}
          </p>
        </div>
        <ProjectsTable canCreate={can(viewer, "project:create")} canExport={can(viewer, "reports:view")} firstPage={firstPage} />
      </div>
    </div>
  );
}
