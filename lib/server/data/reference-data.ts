import "server-only";
import { Jurisdiction, User, Utility } from "@/models";
import type { Viewer } from "@/lib/domain/permissions";
import { db } from "../db";

export type JurisdictionDto = { id: string; name: string; state: string; necEdition: number; recordLowTempC: number; highDesignTempC: number; notes: string };
export type UtilityDto = { id: string; name: string; serviceVoltages: string[]; notes: string };

export async function listJurisdictions({ viewer }: { viewer: Viewer }): Promise<JurisdictionDto[]> {
  db();
  const rows = await Jurisdiction.findAll({ where: { organizationId: viewer.organizationId }, order: [["name", "ASC"]] });
  return rows.map(({ id, name, state, necEdition, recordLowTempC, highDesignTempC, notes }) => ({ id, name, state, necEdition, recordLowTempC, highDesignTempC, notes }));
}

export async function listUtilities({ viewer }: { viewer: Viewer }): Promise<UtilityDto[]> {
  db();
  const rows = await Utility.findAll({ where: { organizationId: viewer.organizationId }, order: [["name", "ASC"]] });
  return rows.map(({ id, name, serviceVoltages, notes }) => ({ id, name, serviceVoltages, notes }));
}

type Option = { id: string; name: string };

/** The choices of the project form, all from the viewer's organization. */
export async function getProjectFormOptions({ viewer }: { viewer: Viewer }) {
  db();
  const [jurisdictions, utilities, people] = await Promise.all([
    listJurisdictions({ viewer }),
    listUtilities({ viewer }),
    User.findAll({ where: { organizationId: viewer.organizationId, isActive: true }, order: [["name", "ASC"]] }),
  ]);
  const pick = (rows: { id: string; name: string }[]): Option[] => rows.map(({ id, name }) => ({ id, name }));
  return {
    jurisdictions: jurisdictions.map((j) => ({ id: j.id, name: `${j.name} (NEC ${j.necEdition})` })),
    utilities: pick(utilities),
    coordinators: pick(people.filter((u) => u.role === "coordinator" || u.role === "admin")),
    installers: pick(people.filter((u) => u.role === "installer")),
  };
}
