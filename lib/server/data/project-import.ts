import "server-only";
import { Op, type Transaction } from "sequelize";
import { Jurisdiction, Project, User, Utility } from "@/models";
import { can, type Viewer } from "@/lib/domain/permissions";
import { AppError } from "@/lib/errors";
import type { ImportPreviewDto, ImportRowDto } from "@/lib/dto/project-import";
import { planImport, projectMatchKey, type ImportLookups, type ImportMapping, type ImportRowPlan } from "@/lib/spreadsheets/project-import";
import { readCsv } from "@/lib/spreadsheets/read-csv";
import { db } from "../db";
import { recordAudit } from "./audit";
import { insertProject } from "./projects";

function assertMayImport(viewer: Viewer) {
  if (!can(viewer, "projects:import")) throw new AppError("FORBIDDEN", "Only admins and coordinators import projects.");
}

/** What an imported row may name: the organization's authorities, its active office staff and installers. */
async function loadLookups(viewer: Viewer, transaction?: Transaction): Promise<ImportLookups> {
  const organizationId = viewer.organizationId;
  const [jurisdictions, utilities, people] = await Promise.all([
    Jurisdiction.findAll({ where: { organizationId }, attributes: ["id", "name"], transaction }),
    Utility.findAll({ where: { organizationId }, attributes: ["id", "name"], transaction }),
    User.findAll({ where: { organizationId, isActive: true }, attributes: ["id", "name", "email", "role"], transaction }),
  ]);
  const person = (u: User) => ({ id: u.id, name: u.name, email: u.email });
  return {
    jurisdictions: jurisdictions.map((j) => ({ id: j.id, name: j.name })),
    utilities: utilities.map((u) => ({ id: u.id, name: u.name })),
    coordinators: people.filter((u) => u.role === "admin" || u.role === "coordinator").map(person),
    installers: people.filter((u) => u.role === "installer").map(person),
  };
}

/** The organization's projects by their match key (account number and address), each with its number. */
async function loadExistingKeys(viewer: Viewer, transaction?: Transaction): Promise<Map<string, number>> {
  const projects = await Project.findAll({
    where: { organizationId: viewer.organizationId, street: { [Op.ne]: "" } },
    attributes: ["number", "utilityAccountNumber", "street", "postalCode"],
    transaction,
  });
  return new Map(projects.map((p) => [projectMatchKey(p), p.number]));
}

const toRow = (plan: ImportRowPlan): ImportRowDto => ({
  line: plan.line,
  label: plan.label,
  status: plan.status,
  problems: plan.status === "problem" ? plan.problems : [],
  projectNumber: plan.status === "already" ? plan.existingNumber : null,
  projectId: null,
  sameAsLine: plan.status === "already" ? plan.sameAsLine : null,
});

function summarize(mapping: ImportMapping, problem: string | null, rows: ImportRowDto[]): ImportPreviewDto {
  const count = (status: ImportRowDto["status"]) => rows.filter((r) => r.status === status).length;
  return {
    mapping,
    problem,
    rows,
    counts: { ready: count("ready"), problem: count("problem"), already: count("already"), imported: count("imported") },
  };
}

type ImportRequest = { viewer: Viewer; csv: string; mapping: ImportMapping };

/** Each row of the file checked as it would be imported; nothing is saved. */
export async function previewProjectImport({ viewer, csv, mapping }: ImportRequest): Promise<ImportPreviewDto> {
  assertMayImport(viewer);
  db();
  const sheet = readCsv(csv);
  if (sheet.problem) return summarize(mapping, sheet.problem, []);
  const [lookups, existing] = await Promise.all([loadLookups(viewer), loadExistingKeys(viewer)]);
  return summarize(mapping, null, planImport(sheet.rows, mapping, lookups, existing).map(toRow));
}

/**
 * Imports every row without a problem in one transaction and reports the rest: a row with a problem saves
 * nothing, a project the company already has (same account number and address) is not made twice. Imports
 * of one organization wait for each other, so two at once cannot both add the same project.
 */
export async function importProjects({ viewer, csv, mapping }: ImportRequest): Promise<ImportPreviewDto> {
  assertMayImport(viewer);
  const sheet = readCsv(csv);
  if (sheet.problem) return summarize(mapping, sheet.problem, []);
  const rows = await db().transaction(async (transaction) => {
    await db().query("SELECT pg_advisory_xact_lock(hashtext(:key))", {
      replacements: { key: `project-import:${viewer.organizationId}` },
      transaction,
    });
    const [lookups, existing] = await Promise.all([loadLookups(viewer, transaction), loadExistingKeys(viewer, transaction)]);
    const done: ImportRowDto[] = [];
    for (const plan of planImport(sheet.rows, mapping, lookups, existing)) {
      if (plan.status !== "ready") {
        done.push(toRow(plan));
        continue;
      }
      const created = await insertProject({
        viewer,
        values: plan.values,
        transaction,
        note: `Project imported from a spreadsheet (line ${plan.line})`,
      });
      done.push({ ...toRow(plan), status: "imported", projectNumber: created.number, projectId: created.id });
    }
    const imported = done.filter((r) => r.status === "imported").length;
    await recordAudit(
      {
        viewer,
        action: "projects.imported",
        entityType: "organization",
        entityId: viewer.organizationId,
        changes: { imported: { before: null, after: imported }, notImported: { before: null, after: done.length - imported } },
      },
      { transaction },
    );
    return done;
  });
  return summarize(mapping, null, rows);
}
