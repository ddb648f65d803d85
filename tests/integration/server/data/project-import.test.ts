// Importing projects from a spreadsheet: every good row in one transaction, each bad row named and left
// out, and a second import of the same file adding nothing (matched on account number and address).
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Filing, Project, StageChange } from "@/models";
import { importProjects, previewProjectImport } from "@/lib/server/data/project-import";
import { guessMapping } from "@/lib/spreadsheets/project-import";
import { readCsv } from "@/lib/spreadsheets/read-csv";
import { closeDb } from "../../support/db";
import { makeOrganization, type OrgFixture } from "../../support/fixtures";

let org: OrgFixture;
let csv: string;

beforeAll(async () => {
  org = await makeOrganization("Import");
  const header =
    "Customer,Site address,Town,State,Zip code,AHJ,Utility,Account number,Meter number,Main breaker,Busbar,Coordinator,Installer";
  const row = (n: number) =>
    `Owner ${n},${n} Larch Way,Fernwick,CO,8030${n % 10},${org.jurisdiction.name},${org.utility.name},ACC-${n},M-${n},200,200,${org.users.coordinator.email},Ivo Installer`;
  const lines = Array.from({ length: 10 }, (_, i) => row(i + 1));
  lines[3] = lines[3]!.replace("8030", "803"); // line 5: a four-digit ZIP
  lines[7] = lines[7]!.replace(org.utility.name, "Nowhere Electric"); // line 9: a utility the company does not have
  csv = [header, ...lines].join("\r\n");
});

afterAll(async () => {
  await closeDb();
});

const mapping = () => guessMapping(readCsv(csv).headers);
const mine = () => Project.count({ where: { organizationId: org.organization.id } });

describe("project import", () => {
  it("previews every row with its problems named and saves nothing", async () => {
    const preview = await previewProjectImport({ viewer: org.viewers.coordinator, csv, mapping: mapping() });
    expect(preview.counts).toEqual({ ready: 8, problem: 2, already: 0, imported: 0 });
    expect(preview.rows.filter((r) => r.status === "problem")).toEqual([
      expect.objectContaining({ line: 5, label: "Owner 4, 4 Larch Way", problems: ["ZIP: Use a 5-digit ZIP code"] }),
      expect.objectContaining({ line: 9, problems: ["Utility: “Nowhere Electric” is not one of your utilities"] }),
    ]);
    expect(await mine()).toBe(0);
  });

  it("imports the eight good rows of ten, names the two problems, and adds nothing on a second import", async () => {
    const result = await importProjects({ viewer: org.viewers.coordinator, csv, mapping: mapping() });
    expect(result.counts).toEqual({ ready: 0, problem: 2, already: 0, imported: 8 });
    expect(result.rows.filter((r) => r.status === "problem").map((r) => [r.line, r.problems])).toEqual([
      [5, ["ZIP: Use a 5-digit ZIP code"]],
      [9, ["Utility: “Nowhere Electric” is not one of your utilities"]],
    ]);
    const projects = await Project.findAll({ where: { organizationId: org.organization.id }, order: [["number", "ASC"]] });
    expect(projects.map((p) => p.customerName)).toEqual([
      "Owner 1",
      "Owner 2",
      "Owner 3",
      "Owner 5",
      "Owner 6",
      "Owner 7",
      "Owner 9",
      "Owner 10",
    ]);
    expect(projects[0]).toMatchObject({
      street: "1 Larch Way",
      postalCode: "80301",
      jurisdictionId: org.jurisdiction.id,
      utilityId: org.utility.id,
      utilityAccountNumber: "ACC-1",
      meterNumber: "M-1",
      coordinatorId: org.users.coordinator.id,
      installerId: org.users.installer.id,
      stage: "draft",
    });
    // Each imported project starts like one made by hand: its timeline entry and its two default filings.
    expect(await StageChange.count({ where: { projectId: projects[0]!.id } })).toBe(1);
    expect(await Filing.count({ where: { projectId: projects[0]!.id } })).toBe(2);

    const again = await importProjects({ viewer: org.viewers.admin, csv, mapping: mapping() });
    expect(again.counts).toEqual({ ready: 0, problem: 2, already: 8, imported: 0 });
    expect(again.rows.find((r) => r.line === 2)).toMatchObject({ status: "already", projectNumber: projects[0]!.number });
    expect(await mine()).toBe(8);
  });

  it("refuses installers", async () => {
    await expect(importProjects({ viewer: org.viewers.installer, csv, mapping: mapping() })).rejects.toMatchObject({ code: "FORBIDDEN" });
    await expect(previewProjectImport({ viewer: org.viewers.installer, csv, mapping: mapping() })).rejects.toMatchObject({
      code: "FORBIDDEN",
    });
  });
});
