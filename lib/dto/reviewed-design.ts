import type { Design, NecEdition, ReviewResult, Site } from "@/lib/engineering";
import type { DesignProblem } from "@/lib/design/to-engine";
import type { DesignInput } from "@/lib/schemas/design";
import type { EquipmentDto } from "@/lib/schemas/equipment";
import type { ProjectDto } from "./projects";

type Item<K extends EquipmentDto["kind"]> = Extract<EquipmentDto, { kind: K }>;

/**
 * The project's saved design as reviewed, built once per use from one read of the project and one
 * review: packets print it, fees are priced from its ratings, the field record is checked against it.
 */
export type ReviewedDesign = {
  project: ProjectDto;
  jurisdiction: { id: string; name: string; state: string; necEdition: NecEdition; recordLowTempC: number; highDesignTempC: number };
  utility: { id: string; name: string; acceptedGridProfiles: string[] } | null;
  /** The saved design's revision (0 before the first save): a packet records which one it was drawn from. */
  designRevision: number;
  /** The saved draft, parsed: what the editor holds. */
  designInput: DesignInput;
  /** The same design as the review engine read it. */
  design: Design;
  site: Site;
  review: ReviewResult;
  /** The catalog items the design names, in the equipment schedule's shape. */
  equipment: {
    module: Item<"module">;
    inverters: { lineId: string; quantity: number; item: Item<"inverter"> }[];
    device: Item<"device"> | null;
    /** The batteries and battery inverter of a design with storage, each once; empty without. */
    storage: EquipmentDto[];
  };
};

/** A design that cannot be reviewed yet says why, first problem first. */
export type DesignSnapshot =
  { status: "reviewed"; reviewed: ReviewedDesign } | { status: "incomplete"; project: ProjectDto; problems: DesignProblem[] };
