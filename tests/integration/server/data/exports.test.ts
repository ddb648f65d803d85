// Spreadsheet exports read back with papaparse: the projects list with its filters, filings with their
// dates, payments and refunds by the organization's day with money as decimals and the currency.
import Papa from "papaparse";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Filing, Organization, Payment, PaymentLine, Refund } from "@/models";
import { listAllProjects } from "@/lib/server/data/projects";
import { listFilingsForExport, listLedgerForExport } from "@/lib/server/data/exports";
import { ProjectListQuery } from "@/lib/schemas/project";
import { projectCsvColumns } from "@/lib/spreadsheets/project-columns";
import { FILING_CSV_COLUMNS, LEDGER_CSV_COLUMNS } from "@/lib/spreadsheets/report-columns";
import { toCsv } from "@/lib/spreadsheets/write-csv";
import { closeDb } from "../../support/db";
import { makeOrganization, makeProject, type OrgFixture } from "../../support/fixtures";

let org: OrgFixture;
const ZONE = "America/Denver";
const read = (text: string) => Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ""), { header: true, skipEmptyLines: true });

beforeAll(async () => {
  org = await makeOrganization("Exports");
  await Organization.update({ timeZone: ZONE }, { where: { id: org.organization.id } });
});

afterAll(async () => {
  await closeDb();
});

describe("the projects export", () => {
  it("writes every project the filters keep, with the list's columns and the fields an import reads back", async () => {
    await makeProject(org, { customerName: 'Okafor, "Dee"', street: "9 Comma Row", utilityAccountNumber: "ACC-1", waitingOn: "ahj" });
    await makeProject(org, { customerName: "Idle Owner", waitingOn: "office" });
    const query = ProjectListQuery.parse({ waitingOn: "ahj" });
    const text = toCsv(projectCsvColumns(ZONE), await listAllProjects({ viewer: org.viewers.coordinator, query, limit: 100 }));
    const parsed = read(text);
    expect(parsed.errors).toEqual([]);
    expect(parsed.meta.fields).toEqual([
      "No.",
      "Customer",
      "Customer e-mail",
      "Customer phone",
      "Street",
      "City",
      "State",
      "ZIP",
      "AHJ",
      "Utility",
      "Utility account",
      "Meter",
      "Main breaker (A)",
      "Busbar (A)",
      "Service voltage (V)",
      "Service phases",
      "Coordinator",
      "Installer",
      "Stage",
      "Stage since",
      "Days in stage",
      "Waiting on",
      "Waiting since",
      "Permit status",
      "Interconnection status",
      "Set aside",
      "Created",
    ]);
    expect(parsed.data).toHaveLength(1);
    expect(parsed.data[0]).toMatchObject({
      Customer: 'Okafor, "Dee"',
      Street: "9 Comma Row",
      AHJ: org.jurisdiction.name,
      "Utility account": "ACC-1",
      "Main breaker (A)": "200",
      "Waiting on": "AHJ",
      Coordinator: "Cora Coordinator",
    });
    expect(parsed.data[0]!["Created"]).toMatch(/^\d{4}-\d{2}-\d{2}$/);
  });
});

describe("the filings export", () => {
  it("lists filings submitted in the range with ISO dates and counts", async () => {
    const project = await makeProject(org, { customerName: "Filed Owner" });
    const filing = (submittedOn: string) =>
      Filing.create({
        organizationId: org.organization.id,
        projectId: project.id,
        kind: "other",
        authorityKind: "jurisdiction",
        authorityId: org.jurisdiction.id,
        authorityName: org.jurisdiction.name,
        status: "approved",
        statusSince: new Date(),
        referenceNumber: "BP-77",
        submittedOn,
        decidedOn: "2026-03-09",
        createdById: null,
      });
    await filing("2026-03-02");
    await filing("2026-04-02");
    const rows = read(
      toCsv(FILING_CSV_COLUMNS, await listFilingsForExport({ viewer: org.viewers.admin, range: { from: "2026-03-01", to: "2026-03-31" } })),
    );
    expect(rows.data).toEqual([
      expect.objectContaining({
        Customer: "Filed Owner",
        Filing: "Other approval",
        Status: "Approved",
        "Reference number": "BP-77",
        Submitted: "2026-03-02",
        Decided: "2026-03-09",
        "Correction rounds": "0",
      }),
    ]);
  });
});

describe("the payments and refunds export", () => {
  it("dates each entry by the organization's day, writes money as decimals with the currency and refunds as negative", async () => {
    const project = await makeProject(org, { customerName: "Paying Owner" });
    // 05:30 UTC on March 3 is still March 2 in Denver (UTC−7).
    const payment = await Payment.create({
      organizationId: org.organization.id,
      projectId: project.id,
      status: "partially_refunded",
      amountCents: 123_450,
      refundedCents: 2_005,
      paymentIntentId: `pi_${org.tag}`,
      receiptNumber: `R-${org.tag}`,
      paidAt: new Date("2026-03-03T05:30:00Z"),
      createdById: null,
    });
    await PaymentLine.create({
      paymentId: payment.id,
      feeKey: "p",
      authority: "AHJ",
      name: "Solar permit",
      arithmetic: [],
      amountCents: 100_000,
    });
    await PaymentLine.create({
      paymentId: payment.id,
      feeKey: "r",
      authority: "AHJ",
      name: "Plan review",
      arithmetic: [],
      amountCents: 23_450,
    });
    await Refund.create({
      paymentId: payment.id,
      processorRefundId: `re_${org.tag}`,
      amountCents: 2_005,
      reason: "Plan review waived",
      createdById: null,
      createdAt: new Date("2026-03-20T18:00:00Z"),
    });
    await Payment.create({
      organizationId: org.organization.id,
      projectId: project.id,
      status: "pending",
      amountCents: 5_000,
      createdById: null,
    });
    const rows = await listLedgerForExport({
      viewer: org.viewers.coordinator,
      range: { from: "2026-03-01", to: "2026-03-31" },
      timeZone: ZONE,
    });
    expect(read(toCsv(LEDGER_CSV_COLUMNS, rows)).data).toEqual([
      {
        Date: "2026-03-02",
        Entry: "Payment",
        "Project no.": String(project.number),
        Customer: "Paying Owner",
        "Receipt number": `R-${org.tag}`,
        "Processor reference": `pi_${org.tag}`,
        Description: "Plan review; Solar permit",
        Amount: "1234.50",
        Currency: "USD",
        Status: "partially refunded",
      },
      {
        Date: "2026-03-20",
        Entry: "Refund",
        "Project no.": String(project.number),
        Customer: "Paying Owner",
        "Receipt number": `R-${org.tag}`,
        "Processor reference": `re_${org.tag}`,
        Description: "Plan review waived",
        Amount: "-20.05",
        Currency: "USD",
        Status: "succeeded",
      },
    ]);
    expect(
      await listLedgerForExport({ viewer: org.viewers.coordinator, range: { from: "2026-03-03", to: "2026-03-19" }, timeZone: ZONE }),
    ).toEqual([]);
  });

  it("refuses installers", async () => {
    await expect(
      listLedgerForExport({ viewer: org.viewers.installer, range: { from: "2026-03-01", to: "2026-03-31" }, timeZone: ZONE }),
    ).rejects.toMatchObject({ code: "FORBIDDEN" });
  });
});
