import { NextResponse } from "next/server";
import { can } from "@/lib/domain/permissions";
import { localIsoDate } from "@/lib/domain/time-zones";
import { AppError } from "@/lib/errors";
import { createProject, listAllProjects, listProjects } from "@/lib/server/data/projects";
import { EXPORT_ROW_LIMIT } from "@/lib/server/data/exports";
import { getOrganization } from "@/lib/server/data/organizations";
import { csvResponse, wantsCsv } from "@/lib/server/csv-response";
import { readJson, withAuth } from "@/lib/server/http";
import { projectCsvColumns } from "@/lib/spreadsheets/project-columns";
import { toCsv } from "@/lib/spreadsheets/write-csv";
import { ProjectInput, ProjectListQuery } from "@/lib/schemas/project";

// GET /api/v1/projects – list, paged, sorted, searched and filtered by stage; every matching row as CSV with ?format=csv or Accept: text/csv
export const GET = withAuth(
  async (request, { viewer }) => {
    const query = ProjectListQuery.parse(Object.fromEntries(request.nextUrl.searchParams));
    if (!wantsCsv(request)) return NextResponse.json(await listProjects({ viewer, query }));
    if (!can(viewer, "reports:view")) throw new AppError("FORBIDDEN", "Spreadsheet exports are for the office: admins and coordinators.");
    const [projects, { timeZone }] = await Promise.all([
      listAllProjects({ viewer, query, limit: EXPORT_ROW_LIMIT }),
      getOrganization({ viewer }),
    ]);
    const today = localIsoDate(new Date().toISOString(), timeZone);
    return csvResponse(`projects-${today}.csv`, toCsv(projectCsvColumns(timeZone), projects));
  },
  { permission: "project:view" },
);

// POST /api/v1/projects – create a project in the draft stage
export const POST = withAuth(
  async (request, { viewer }) => {
    const values = ProjectInput.parse(await readJson(request));
    return NextResponse.json(await createProject({ viewer, values }), { status: 201 });
  },
  { permission: "project:create" },
);
