import "server-only";
import type { Transaction } from "sequelize";
import { Jurisdiction, Utility } from "@/models";
import type { AuthorityKind } from "@/lib/domain/authorities";
import type { AdoptedEssSiting } from "@/lib/authorities/ess-siting";
import { can, type Viewer } from "@/lib/domain/permissions";
import { AppError } from "@/lib/errors";
import type { JurisdictionValues, UtilityValues } from "@/lib/schemas/reference-data";
import { db } from "../db";
import { diffFields } from "./audit";
import { writeWithAudit } from "./audited-write";
import { isUuid } from "./ids";

// The authorities a project answers to (AHJs and utilities), kept, listed and changed the same way;
// what differs per kind is its model, its fields and its words (lib/authorities/specs.ts).

export type JurisdictionDto = {
  id: string;
  name: string;
  state: string;
  necEdition: number;
  recordLowTempC: number;
  highDesignTempC: number;
  reviewDays: number;
  permitValidDays: number;
  requiredInspections: string[];
  notes: string;
} & AdoptedEssSiting;
export type UtilityDto = {
  id: string;
  name: string;
  serviceVoltages: string[];
  acceptedGridProfiles: string[];
  reviewDays: number;
  requiredInspections: string[];
  notes: string;
};
export type AuthorityDto<K extends AuthorityKind> = K extends "jurisdiction" ? JurisdictionDto : UtilityDto;
export type AuthorityValues<K extends AuthorityKind> = K extends "jurisdiction" ? JurisdictionValues : UtilityValues;

type Row = Jurisdiction | Utility;
type KindStore = {
  find: (where: { id: string; organizationId: string }, transaction?: Transaction) => Promise<Row | null>;
  list: (organizationId: string) => Promise<Row[]>;
  create: (values: Record<string, unknown>, transaction: Transaction) => Promise<Row>;
  toDto: (row: Row) => JurisdictionDto | UtilityDto;
};

const STORES: Record<AuthorityKind, KindStore> = {
  jurisdiction: {
    find: (where, transaction) => Jurisdiction.findOne({ where, transaction, lock: transaction?.LOCK.UPDATE }),
    list: (organizationId) => Jurisdiction.findAll({ where: { organizationId }, order: [["name", "ASC"]] }),
    create: (values, transaction) => Jurisdiction.create(values as never, { transaction }),
    toDto: (row) => {
      const j = row as Jurisdiction;
      const { id, name, state, necEdition, recordLowTempC, highDesignTempC, reviewDays, permitValidDays, requiredInspections, notes } = j;
      return {
        ...{ id, name, state, necEdition, recordLowTempC, highDesignTempC, reviewDays, permitValidDays, requiredInspections, notes },
        ...adoptedEssSiting(j),
      };
    },
  },
  utility: {
    find: (where, transaction) => Utility.findOne({ where, transaction, lock: transaction?.LOCK.UPDATE }),
    list: (organizationId) => Utility.findAll({ where: { organizationId }, order: [["name", "ASC"]] }),
    create: (values, transaction) => Utility.create(values as never, { transaction }),
    toDto: (row) => {
      const { id, name, serviceVoltages, acceptedGridProfiles, reviewDays, requiredInspections, notes } = row as Utility;
      return { id, name, serviceVoltages, acceptedGridProfiles, reviewDays, requiredInspections, notes };
    },
  },
};

/** The ESS siting figures an AHJ row holds, for its DTO and for the review's site. */
export function adoptedEssSiting(j: Jurisdiction): AdoptedEssSiting {
  return {
    essCode: j.essCode ?? null,
    essPerUnitKwh: j.essPerUnitKwh ?? null,
    essGarageKwh: j.essGarageKwh ?? null,
    essOutdoorKwh: j.essOutdoorKwh ?? null,
    essUtilitySpaceKwh: j.essUtilitySpaceKwh ?? null,
  };
}

/** NOT_FOUND for missing, foreign and malformed ids alike. */
async function findOwn(kind: AuthorityKind, viewer: Viewer, id: string, transaction?: Transaction): Promise<Row> {
  const row = isUuid(id) ? await STORES[kind].find({ id, organizationId: viewer.organizationId }, transaction) : null;
  if (!row) throw new AppError("NOT_FOUND", `No such ${kind}.`);
  return row;
}

/** The viewer's organization's authorities of one kind, by name. */
export async function listAuthorities<K extends AuthorityKind>({ viewer, kind }: { viewer: Viewer; kind: K }): Promise<AuthorityDto<K>[]> {
  db();
  return (await STORES[kind].list(viewer.organizationId)).map((row) => STORES[kind].toDto(row) as AuthorityDto<K>);
}

/** One authority of the viewer's organization; NOT_FOUND for missing and foreign ids alike. */
export async function getAuthorityById<K extends AuthorityKind>({
  viewer,
  kind,
  authorityId,
}: {
  viewer: Viewer;
  kind: K;
  authorityId: string;
}): Promise<AuthorityDto<K>> {
  db();
  return STORES[kind].toDto(await findOwn(kind, viewer, authorityId)) as AuthorityDto<K>;
}

/**
 * Adds an authority (no id) or changes one (admins), audited in the same transaction. Reviews read an
 * AHJ's edition and temperatures from their next run on; the field record reads a utility's profiles.
 */
export async function saveAuthority<K extends AuthorityKind>({
  viewer,
  kind,
  authorityId,
  values,
}: {
  viewer: Viewer;
  kind: K;
  authorityId?: string;
  values: AuthorityValues<K>;
}): Promise<AuthorityDto<K>> {
  if (!can(viewer, "reference:edit")) throw new AppError("FORBIDDEN", "Only admins can change jurisdictions and utilities.");
  const store = STORES[kind];
  const row = await writeWithAudit(
    { viewer, action: `${kind}.${authorityId ? "updated" : "created"}`, entityType: kind },
    async (transaction) => {
      if (!authorityId)
        return {
          row: await store.create({ organizationId: viewer.organizationId, ...values }, transaction),
          changes: diffFields<Record<string, unknown>>({}, values),
        };
      const found = await findOwn(kind, viewer, authorityId, transaction);
      const changes = diffFields<Record<string, unknown>>(store.toDto(found), values);
      return { row: await (found as Jurisdiction).update(values as never, { transaction }), changes };
    },
  );
  return store.toDto(row) as AuthorityDto<K>;
}
