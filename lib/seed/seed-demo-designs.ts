import { Op, type Transaction } from "sequelize";
import { CommissioningRecord, Design, Equipment, Jurisdiction, Project, StageChange, Utility } from "@/models";
import { STAGES, stageIndex } from "@/lib/domain/stages";
import { commissioningFacts, moduleMonitoringOf } from "@/lib/field/commissioning-facts";
import { runDesignReview } from "@/lib/design/run-review";
import type { NecEdition } from "@/lib/engineering";
import type { EquipmentDto } from "@/lib/schemas/equipment";
import { demoEquipment, passingDemoReadings } from "./demo-commissioning";
import { DESIGN_MODELS, demoDesign, type CatalogIds } from "./demo-designs";
import { DEMO_STORAGE_CUSTOMERS, STORAGE_MODELS, demoStorageDesign, type StorageIds } from "./demo-storage-designs";

/**
 * Gives every demo project past "Draft" a design, reviewed as the editor would on save, and every
 * project already commissioned a complete commissioning record worked out from that design.
 */
export async function seedDemoDesigns(organizationId: string, transaction: Transaction) {
  const items = await Equipment.findAll({ where: { organizationId }, transaction });
  const catalog = items.map(
    (e) =>
      ({
        id: e.id,
        kind: e.kind,
        maker: e.maker,
        model: e.model,
        listing: e.listing,
        specs: e.specs,
        isArchived: false,
        datasheet: null,
      }) as EquipmentDto,
  );
  const idsOf = (models: Record<string, string>) =>
    Object.fromEntries(Object.entries(models).map(([key, model]) => [key, catalog.find((c) => c.model === model)?.id ?? ""]));
  const ids = idsOf(DESIGN_MODELS) as CatalogIds;
  const storageIds = idsOf(STORAGE_MODELS) as StorageIds;
  const jurisdictions = new Map((await Jurisdiction.findAll({ where: { organizationId }, transaction })).map((j) => [j.id, j]));
  const utilities = new Map((await Utility.findAll({ where: { organizationId }, transaction })).map((u) => [u.id, u]));
  const projects = await Project.findAll({
    where: { organizationId, stage: { [Op.ne]: "draft" } },
    order: [["number", "ASC"]],
    transaction,
  });

  for (const [i, project] of projects.entries()) {
    const service = { busbarA: project.busbarA ?? 200, mainBreakerA: project.mainBreakerA ?? 200 };
    const scenario = DEMO_STORAGE_CUSTOMERS[project.customerName];
    const draft = scenario ? demoStorageDesign(ids, storageIds, service, scenario, i) : demoDesign(ids, service, i);
    const j = project.jurisdictionId ? jurisdictions.get(project.jurisdictionId) : undefined;
    const outcome = runDesignReview(
      draft,
      catalog,
      j ? { recordLowTempC: j.recordLowTempC, highDesignTempC: j.highDesignTempC, necEdition: j.necEdition as NecEdition } : null,
    );
    await Design.create(
      {
        organizationId,
        projectId: project.id,
        draft: draft as unknown as Record<string, unknown>,
        reviewStatus: outcome.status === "reviewed" ? outcome.review.summary.status : "incomplete",
        reviewSummary: outcome.status === "reviewed" ? { ...outcome.review.summary } : null,
        updatedById: project.coordinatorId,
      },
      { transaction },
    );
    if (outcome.status === "reviewed" && j && stageIndex(project.stage) >= STAGES.indexOf("commissioned")) {
      const { ratings } = outcome.review.summary;
      const acceptedGridProfiles = (project.utilityId ? utilities.get(project.utilityId)?.acceptedGridProfiles : null) ?? [];
      const moduleMonitoring = moduleMonitoringOf(demoEquipment(draft, catalog));
      const facts = commissioningFacts({
        design: outcome.design,
        edition: j.necEdition as NecEdition,
        acceptedGridProfiles,
        moduleCount: ratings.moduleCount,
        acKw: ratings.acKw,
        moduleMonitoring,
      });
      const readings = passingDemoReadings(facts, i);
      // Completed on the day the timeline says the project was commissioned.
      const commissioned = await StageChange.findOne({ where: { projectId: project.id, toStage: "commissioned" }, transaction });
      const completedAt = commissioned?.createdAt ?? project.stageChangedAt;
      await CommissioningRecord.create(
        {
          organizationId,
          projectId: project.id,
          readings: readings as unknown as Record<string, unknown>,
          status: "complete",
          completedAt,
          completedById: project.installerId,
          updatedById: project.installerId,
          createdAt: completedAt,
          updatedAt: completedAt,
        },
        { transaction, silent: true },
      );
    }
  }
}
