import type { Transaction } from "sequelize";
import { CorrectionRound, Filing, FilingItem, Inspection, Jurisdiction, Project, StageChange, Utility } from "@/models";
import { stageIndex, type Stage } from "@/lib/domain/stages";
import { localIsoDate } from "@/lib/domain/time-zones";
import { refreshProjectFacts } from "@/lib/server/data/project-facts";

const DAY_MS = 86_400_000;
// The demo company keeps Denver's time (demo-scenario); its calendar days are Denver's.
const day = (d: Date) => localIsoDate(d.toISOString(), "America/Denver");
const plus = (d: Date, days: number) => new Date(d.getTime() + days * DAY_MS);

// Invented plan-review comments and inspection corrections for the demo.
const ROUND_ITEMS = [
  [
    {
      text: "Show the rapid shutdown initiator's location on the site plan.",
      reference: "PV-1",
      response: "Initiator added beside the service disconnect on PV-1.",
      designRevision: 2,
    },
    {
      text: "Provide the structural letter for the rafter spans.",
      reference: "PV-5",
      response: "Letter from the engineer of record attached.",
    },
  ],
  [
    {
      text: "The AC disconnect label must state the rated current and voltage.",
      reference: "NEC 690.54",
      response: "Label sheet updated with the inverter output ratings.",
      designRevision: 2,
    },
    {
      text: "Conduit run across the roof needs its height above the roof shown.",
      reference: "PV-3",
      response: "Height noted on the single-line diagram.",
      designRevision: 2,
    },
    { text: "Include the module data sheet.", reference: "", response: "Data sheet appended to the packet." },
  ],
  [
    {
      text: "Point of connection: show the breaker position at the opposite end of the busbar.",
      reference: "NEC 705.12(B)",
      response: "Breaker position shown on PV-3.",
      designRevision: 2,
    },
    {
      text: "Add the fire setbacks from the ridge.",
      reference: "PV-1",
      response: "Setbacks dimensioned on the roof plan.",
      designRevision: 2,
    },
  ],
];

// Two projects on hold and one cancelled, by project number (invented reasons).
const HOLDS = new Map<number, { state: "on_hold" | "cancelled"; reason: string }>([
  [3, { state: "on_hold", reason: "The customer is re-roofing before the array goes up" }],
  [16, { state: "on_hold", reason: "Waiting for the customer's HOA to meet" }],
  [13, { state: "cancelled", reason: "The customer sold the house" }],
]);

const INSPECTION_CORRECTIONS = [
  { text: "Conduit strap missing within 3 ft of the junction box.", reference: "NEC 358.30" },
  { text: "Directory at the service does not show the PV disconnect location.", reference: "NEC 705.10" },
];

/**
 * Filings that agree with each demo project's stage: a permit number once the permit is issued, a final
 * inspection once it passed, an interconnection application once it went in, PTO at the end. A few carry a
 * correction round, and a few a failed inspection with its passed re-inspection. Projects keep their
 * stage: each stage the seed set counts as set by hand.
 */
export async function seedDemoFilings(organizationId: string, t: Transaction) {
  const projects = await Project.findAll({ where: { organizationId }, order: [["number", "ASC"]], transaction: t });
  let rounds = 0;
  let failed = 0;
  for (const project of projects) {
    const stage = project.stage as Stage;
    await project.update({ handStage: stage }, { transaction: t, silent: true });
    const moves = await StageChange.findAll({ where: { projectId: project.id }, transaction: t });
    const reached = (s: Stage) => moves.find((m) => m.toStage === s)?.createdAt ?? null;
    const past = (s: Stage) => stageIndex(stage) >= stageIndex(s);
    const ahj = await Jurisdiction.findByPk(project.jurisdictionId!, { transaction: t });
    const utility = await Utility.findByPk(project.utilityId!, { transaction: t });
    if (!ahj || !utility) continue;

    const permitFiled = reached("permit_filed");
    const permitIssued = reached("permit_issued");
    const permit = await Filing.create(
      {
        organizationId,
        projectId: project.id,
        kind: "permit",
        authorityKind: "jurisdiction",
        authorityId: ahj.id,
        authorityName: ahj.name,
        status: past("permit_issued") ? "approved" : past("permit_filed") ? "in_review" : "preparing",
        statusSince: permitIssued ?? permitFiled ?? project.createdAt,
        referenceNumber: past("permit_issued") ? `BP-26-${String(1400 + project.number * 7).padStart(5, "0")}` : null,
        channel: permitFiled ? "portal" : null,
        submittedOn: permitFiled ? day(permitFiled) : null,
        decidedOn: permitIssued ? day(permitIssued) : null,
        expiresOn: permitIssued ? day(plus(permitIssued, ahj.permitValidDays)) : null,
        nextFollowUpOn: permitFiled && !permitIssued ? day(plus(permitFiled, ahj.reviewDays)) : null,
        createdById: project.coordinatorId,
      },
      { transaction: t },
    );
    if (permitFiled && permitIssued && rounds < ROUND_ITEMS.length) {
      const items = ROUND_ITEMS[rounds++]!;
      const received = plus(permitFiled, 1);
      const round = await CorrectionRound.create(
        {
          organizationId,
          filingId: permit.id,
          number: 1,
          receivedOn: day(received),
          revisionAtReceipt: null,
          answeredAt: plus(received, 1),
        },
        { transaction: t },
      );
      await FilingItem.bulkCreate(
        items.map((item, position) => ({
          organizationId,
          roundId: round.id,
          position,
          text: item.text,
          reference: item.reference,
          response: item.response,
          designRevision: item.designRevision ?? null,
          resolved: true,
        })),
        { transaction: t },
      );
    }
    const inspected = reached("inspection_passed");
    if (inspected) {
      if (failed < 2) {
        failed++;
        const first = await Inspection.create(
          {
            organizationId,
            filingId: permit.id,
            kind: "final",
            scheduledFor: day(plus(inspected, -7)),
            timeWindow: "8–12",
            inspectorName: "M. Okafor-Lind",
            result: "failed",
            resultOn: day(plus(inspected, -7)),
            recordedAt: plus(inspected, -7),
          },
          { transaction: t },
        );
        await FilingItem.bulkCreate(
          INSPECTION_CORRECTIONS.map((item, position) => ({
            organizationId,
            inspectionId: first.id,
            position,
            ...item,
            response: "Corrected on site.",
            resolved: true,
          })),
          { transaction: t },
        );
        await Inspection.create(
          {
            organizationId,
            filingId: permit.id,
            kind: "final",
            scheduledFor: day(inspected),
            timeWindow: "12–4",
            inspectorName: "M. Okafor-Lind",
            result: "passed",
            resultOn: day(inspected),
            recordedAt: inspected,
            reinspectionOfId: first.id,
          },
          { transaction: t },
        );
      } else {
        await Inspection.create(
          {
            organizationId,
            filingId: permit.id,
            kind: "final",
            scheduledFor: day(inspected),
            timeWindow: "8–12",
            inspectorName: "J. Petrakis",
            result: "passed",
            resultOn: day(inspected),
            recordedAt: inspected,
          },
          { transaction: t },
        );
      }
    }

    const utilityFiled = reached("utility_filed");
    const utilityApproved = reached("utility_approved");
    const pto = reached("pto_received");
    await Filing.create(
      {
        organizationId,
        projectId: project.id,
        kind: "interconnection",
        authorityKind: "utility",
        authorityId: utility.id,
        authorityName: utility.name,
        status: past("utility_approved") ? "approved" : past("utility_filed") ? "submitted" : "preparing",
        statusSince: utilityApproved ?? utilityFiled ?? project.createdAt,
        referenceNumber: past("utility_approved") ? `IA-${String(55_000 + project.number * 13)}` : null,
        channel: utilityFiled ? "email" : null,
        submittedOn: utilityFiled ? day(utilityFiled) : null,
        decidedOn: utilityApproved ? day(utilityApproved) : null,
        nextFollowUpOn: utilityFiled && !utilityApproved ? day(plus(utilityFiled, utility.reviewDays)) : null,
        ptoOn: pto ? day(pto) : null,
        createdById: project.coordinatorId,
      },
      { transaction: t },
    );
    const aside = HOLDS.get(project.number);
    if (aside && stage !== "closed") {
      await project.update(
        { holdState: aside.state, holdReason: aside.reason, holdSince: project.stageChangedAt },
        { transaction: t, silent: true },
      );
    }
    await refreshProjectFacts(project.id, { transaction: t });
  }
}
