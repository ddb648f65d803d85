import { atMost, fmt, makeCheck } from "../check-result";
import { STRUCTURAL_REVIEW } from "../clauses";
import { requireNonNegative, requireWholePositive } from "../errors";
import type { CheckResult, Design, RoofPlane, Site } from "../types";

// Many AHJs review arrays up to about 4–5 lb/ft² without a structural letter (common practice); above it, expect one.
export const EXPEDITED_DEAD_LOAD_PSF = 5;

export interface RoofPlaneLoad {
  arrayAreaFt2: number;
  totalWeightLb: number;
  deadLoadPsf: number;
  loadPerAttachmentLb: number;
}

/** Distributed dead load = (modules + racking) / array area; load per attachment = the same weight / attachments. */
export function roofPlaneLoad(design: Design, plane: RoofPlane): RoofPlaneLoad {
  const modules = requireWholePositive(plane.moduleCount, `roofPlanes.${plane.id}.moduleCount`, `The number of modules on ${plane.label}`);
  const attachments = requireWholePositive(
    plane.attachmentCount,
    `roofPlanes.${plane.id}.attachmentCount`,
    `The number of attachments on ${plane.label}`,
  );
  const racking = requireNonNegative(plane.rackingWeightLb, `roofPlanes.${plane.id}.rackingWeightLb`, "The racking weight");
  const arrayAreaFt2 = (modules * design.module.lengthIn * design.module.widthIn) / 144;
  const totalWeightLb = modules * design.module.weightLb + racking;
  return { arrayAreaFt2, totalWeightLb, deadLoadPsf: totalWeightLb / arrayAreaFt2, loadPerAttachmentLb: totalWeightLb / attachments };
}

export function checkRoofLoad(design: Design, site: Site, plane: RoofPlane): CheckResult[] {
  if (design.mount === "ground") return [];
  const load = roofPlaneLoad(design, plane);
  const edition = site.necEdition;
  const psfOk = atMost(load.deadLoadPsf, EXPEDITED_DEAD_LOAD_PSF);
  const results = [
    makeCheck({
      id: `roof-dead-load:${plane.id}`,
      title: `${plane.label} dead load`,
      status: psfOk ? "pass" : "warn",
      value: load.deadLoadPsf,
      limit: EXPEDITED_DEAD_LOAD_PSF,
      unit: "lb/ft²",
      clause: STRUCTURAL_REVIEW,
      edition,
      message: `${plane.moduleCount} modules and racking weigh ${fmt(load.totalWeightLb, 1)} lb over ${fmt(load.arrayAreaFt2, 1)} ft², or ${fmt(load.deadLoadPsf)} lb/ft²${psfOk ? ", within the usual limit for review without a structural letter." : "; expect the AHJ to ask for a structural letter."}`,
      fix: psfOk ? undefined : "Get a structural engineer's letter for this roof.",
    }),
  ];
  const rated = design.attachmentRatedLoadLb;
  const perOk = rated === undefined || atMost(load.loadPerAttachmentLb, rated);
  results.push(
    makeCheck({
      id: `roof-attachment-load:${plane.id}`,
      title: `${plane.label} load per attachment`,
      status: perOk ? "pass" : "fail",
      value: load.loadPerAttachmentLb,
      limit: rated ?? null,
      unit: "lb",
      clause: STRUCTURAL_REVIEW,
      edition,
      message: `Each of the ${plane.attachmentCount} attachments carries about ${fmt(load.loadPerAttachmentLb, 1)} lb of dead load${rated === undefined ? "." : perOk ? `, within its ${rated} lb rating.` : `, above its ${rated} lb rating.`}`,
      fix: perOk ? undefined : `Use at least ${Math.ceil(load.totalWeightLb / rated!)} attachments.`,
    }),
  );
  return results;
}
