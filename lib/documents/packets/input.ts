import type { Design, NecEdition, ReviewResult, Site } from "@/lib/engineering";
import type { DesignInput } from "@/lib/schemas/design";
import type { EquipmentDto } from "@/lib/schemas/equipment";
import type { ProjectDto } from "@/lib/dto/projects";
import type { PacketKind } from "@/lib/domain/stored-values";

export const PACKET_TITLES: Record<PacketKind, string> = {
  permit: "Permit packet",
  interconnection: "Interconnection packet",
};

/**
 * Everything a packet shows, gathered once when generation is asked for, so
 * the PDF always matches the design and review of that moment.
 */
export type PacketInput = {
  kind: PacketKind;
  revision: number;
  generatedAt: string; // ISO date-time
  preparedBy: { name: string; organizationName: string; licenseNumber: string | null; phone: string | null; timeZone?: string }; // IANA zone the packet's dates print in
  project: Pick<
    ProjectDto,
    | "number"
    | "customerName"
    | "customerEmail"
    | "customerPhone"
    | "street"
    | "city"
    | "state"
    | "postalCode"
    | "utilityAccountNumber"
    | "meterNumber"
  >;
  jurisdiction: { name: string; state: string; necEdition: NecEdition; recordLowTempC: number; highDesignTempC: number };
  utility: { name: string; acceptedGridProfiles: string[] } | null;
  /** The editor's parsed design (tilt, azimuth, locations, line ids) and the engine's view of it. */
  designInput: DesignInput;
  design: Design;
  site: Site;
  equipment: {
    module: Extract<EquipmentDto, { kind: "module" }>;
    inverters: { lineId: string; quantity: number; item: Extract<EquipmentDto, { kind: "inverter" }> }[];
    device: Extract<EquipmentDto, { kind: "device" }> | null;
    /** The batteries and battery inverter of a design with storage, for their data sheets; absent or empty without. */
    storage?: readonly EquipmentDto[];
  };
  review: ReviewResult;
  /** Set when a coordinator generated the packet despite failing checks; printed on the cover. */
  override: { reason: string; byName: string } | null;
  /** What changed since the previous revision, in plain lines; empty for Rev 1. */
  changes: string[];
  /** Data sheets to append after the generated sheets, in this order (permit packet only); the key is the object in storage. */
  datasheets: { title: string; fileName: string; objectKey?: string }[];
};
