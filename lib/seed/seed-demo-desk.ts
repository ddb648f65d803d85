import type { Transaction } from "sequelize";
import { CorrectionRound, Filing, FilingItem, Inspection, Project } from "@/models";
import { addCalendarDays, localIsoDate } from "@/lib/domain/time-zones";
import { refreshProjectFacts } from "@/lib/server/data/project-facts";

// Invented comments for the demo's open correction round.
const OPEN_ROUND_ITEMS = [
  { text: "Show the main service panel's busbar rating on the single-line diagram.", reference: "Application, section 4" },
  { text: "State the inverter's IEEE 1547 category and the grid profile to be set.", reference: "IEEE 1547-2018" },
];

/**
 * Work for the coordinator's desk on the day the demo is seeded, so the start page is never empty:
 * an overdue follow-up and one due today on permits under review, an unanswered correction round from the utility, and
 * final inspections booked in the coming days on issued permits. Days are the demo company's (Denver).
 */
export async function seedDemoDesk(organizationId: string, t: Transaction, now: number) {
  const today = localIsoDate(new Date(now).toISOString(), "America/Denver");
  const active = { organizationId, holdState: null };
  const underReview = await Project.findAll({ where: { ...active, stage: "permit_filed" }, order: [["number", "ASC"]], transaction: t });
  const issued = await Project.findAll({
    where: { ...active, stage: ["permit_issued", "installed"] },
    order: [["number", "ASC"]],
    transaction: t,
  });
  const permitOf = (projectId: string) => Filing.findOne({ where: { projectId, kind: "permit" }, transaction: t });

  for (const [project, followUp] of underReview.slice(0, 2).map((p, i) => [p, addCalendarDays(today, i === 0 ? -3 : 0)] as const)) {
    await (await permitOf(project.id))?.update({ nextFollowUpOn: followUp }, { transaction: t });
    await refreshProjectFacts(project.id, { transaction: t });
  }
  // The utility came back with questions on the first application under its review.
  const [corrected] = await Project.findAll({ where: { ...active, stage: "utility_filed" }, order: [["number", "ASC"]], transaction: t });
  const filing = corrected ? await Filing.findOne({ where: { projectId: corrected.id, kind: "interconnection" }, transaction: t }) : null;
  if (corrected && filing) {
    const receivedOn = addCalendarDays(today, -4);
    await filing.update(
      { status: "corrections_requested", statusSince: new Date(`${receivedOn}T16:00:00Z`), nextFollowUpOn: null },
      { transaction: t },
    );
    const round = await CorrectionRound.create({ organizationId, filingId: filing.id, number: 1, receivedOn }, { transaction: t });
    await FilingItem.bulkCreate(
      OPEN_ROUND_ITEMS.map((item, position) => ({ organizationId, roundId: round.id, position, ...item })),
      { transaction: t },
    );
    await refreshProjectFacts(corrected.id, { transaction: t });
  }
  for (const [i, project] of issued.slice(0, 2).entries()) {
    const permit = await permitOf(project.id);
    if (!permit) continue;
    await Inspection.create(
      {
        organizationId,
        filingId: permit.id,
        kind: "final",
        scheduledFor: addCalendarDays(today, i === 0 ? 2 : 5),
        timeWindow: i === 0 ? "8–12" : "12–4",
        inspectorName: "J. Petrakis",
      },
      { transaction: t },
    );
    await refreshProjectFacts(project.id, { transaction: t });
  }
}
