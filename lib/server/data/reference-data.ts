import "server-only";
import type { Transaction } from "sequelize";
import { Jurisdiction, User, Utility } from "@/models";
import { can, type Viewer } from "@/lib/domain/permissions";
import { AppError } from "@/lib/errors";
import type { JurisdictionValues, UtilityValues } from "@/lib/schemas/reference-data";
import { db } from "../db";
import { diffFields } from "./audit";
import { writeWithAudit } from "./audited-write";
import { isUuid } from "./ids";

export type JurisdictionDto = { id: string; name: string; state: string; necEdition: number; recordLowTempC: number; highDesignTempC: number; notes: string };
export type UtilityDto = { id: string; name: string; serviceVoltages: string[]; acceptedGridProfiles: string[]; notes: string };

const toJurisdictionDto = ({ id, name, state, necEdition, recordLowTempC, highDesignTempC, notes }: Jurisdiction): JurisdictionDto => ({ id, name, state, necEdition, recordLowTempC, highDesignTempC, notes });
const toUtilityDto = ({ id, name, serviceVoltages, acceptedGridProfiles, notes }: Utility): UtilityDto => ({ id, name, serviceVoltages, acceptedGridProfiles, notes });

/** Where-clause of one row of the viewer's organization, locked when read inside a write. */
const ownRow = (viewer: Viewer, id: string, transaction?: Transaction) => ({ where: { id, organizationId: viewer.organizationId }, transaction, lock: transaction?.LOCK.UPDATE });

/** NOT_FOUND for missing, foreign and malformed ids alike. */
async function orNotFound<T>(id: string, find: () => Promise<T | null>, what: string): Promise<T> {
  const row = isUuid(id) ? await find() : null;
  if (!row) throw new AppError("NOT_FOUND", `No such ${what}.`);
  return row;
}

const findOwnJurisdiction = (viewer: Viewer, id: string, transaction?: Transaction) => orNotFound(id, () => Jurisdiction.findOne(ownRow(viewer, id, transaction)), "jurisdiction");
const findOwnUtility = (viewer: Viewer, id: string, transaction?: Transaction) => orNotFound(id, () => Utility.findOne(ownRow(viewer, id, transaction)), "utility");

function assertCanEdit(viewer: Viewer) {
  if (!can(viewer, "reference:edit")) throw new AppError("FORBIDDEN", "Only admins can change jurisdictions and utilities.");
}

/** The viewer's organization's jurisdictions by name. */
export async function listJurisdictions({ viewer }: { viewer: Viewer }): Promise<JurisdictionDto[]> {
  db();
  const rows = await Jurisdiction.findAll({ where: { organizationId: viewer.organizationId }, order: [["name", "ASC"]] });
  return rows.map(toJurisdictionDto);
}

/** One of the viewer's organization's jurisdictions; NOT_FOUND for missing and foreign ids alike. */
export async function getJurisdictionById({ viewer, jurisdictionId }: { viewer: Viewer; jurisdictionId: string }): Promise<JurisdictionDto> {
  db();
  return toJurisdictionDto(await findOwnJurisdiction(viewer, jurisdictionId));
}

/** Adds an authority having jurisdiction (admins). */
export async function createJurisdiction({ viewer, values }: { viewer: Viewer; values: JurisdictionValues }): Promise<JurisdictionDto> {
  assertCanEdit(viewer);
  const row = await writeWithAudit({ viewer, action: "jurisdiction.created", entityType: "jurisdiction" }, async (transaction) => ({
    row: await Jurisdiction.create({ organizationId: viewer.organizationId, ...values }, { transaction }),
    changes: diffFields({}, values),
  }));
  return toJurisdictionDto(row);
}

/** Changes an authority's edition, design temperatures or notes (admins); reviews read them from the next run on. */
export async function updateJurisdiction({ viewer, jurisdictionId, values }: { viewer: Viewer; jurisdictionId: string; values: JurisdictionValues }): Promise<JurisdictionDto> {
  assertCanEdit(viewer);
  const row = await writeWithAudit({ viewer, action: "jurisdiction.updated", entityType: "jurisdiction" }, async (transaction) => {
    const found = await findOwnJurisdiction(viewer, jurisdictionId, transaction);
    const changes = diffFields(toJurisdictionDto(found), values);
    return { row: await found.update(values, { transaction }), changes };
  });
  return toJurisdictionDto(row);
}

/** The viewer's organization's utilities by name. */
export async function listUtilities({ viewer }: { viewer: Viewer }): Promise<UtilityDto[]> {
  db();
  const rows = await Utility.findAll({ where: { organizationId: viewer.organizationId }, order: [["name", "ASC"]] });
  return rows.map(toUtilityDto);
}

/** One of the viewer's organization's utilities; NOT_FOUND for missing and foreign ids alike. */
export async function getUtilityById({ viewer, utilityId }: { viewer: Viewer; utilityId: string }): Promise<UtilityDto> {
  db();
  return toUtilityDto(await findOwnUtility(viewer, utilityId));
}

/** Adds a utility (admins). */
export async function createUtility({ viewer, values }: { viewer: Viewer; values: UtilityValues }): Promise<UtilityDto> {
  assertCanEdit(viewer);
  const row = await writeWithAudit({ viewer, action: "utility.created", entityType: "utility" }, async (transaction) => ({
    row: await Utility.create({ organizationId: viewer.organizationId, ...values }, { transaction }),
    changes: diffFields({}, values),
  }));
  return toUtilityDto(row);
}

/** Changes a utility's service voltages, accepted grid profiles or notes (admins). */
export async function updateUtility({ viewer, utilityId, values }: { viewer: Viewer; utilityId: string; values: UtilityValues }): Promise<UtilityDto> {
  assertCanEdit(viewer);
  const row = await writeWithAudit({ viewer, action: "utility.updated", entityType: "utility" }, async (transaction) => {
    const found = await findOwnUtility(viewer, utilityId, transaction);
    const changes = diffFields(toUtilityDto(found), values);
    return { row: await found.update(values, { transaction }), changes };
  });
  return toUtilityDto(row);
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
