import "server-only";
import { randomUUID } from "node:crypto";
import { Op, UniqueConstraintError, type Transaction } from "sequelize";
import { Equipment } from "@/models";
import { can, type Viewer } from "@/lib/domain/permissions";
import { AppError } from "@/lib/errors";
import {
  DATASHEET_MAX_BYTES,
  DatasheetFileName,
  EQUIPMENT_KIND_LABELS,
  EquipmentInput,
  type EquipmentDto,
  type EquipmentValues,
} from "@/lib/schemas/equipment";
import type { EquipmentKind } from "@/lib/domain/stored-values";
import { db } from "../db";
import { deleteObject, putObject } from "../services/storage";
import { diffFields } from "./audit";
import { writeWithAudit } from "./audited-write";
import { isUuid } from "./ids";

type WithTransaction = { transaction?: Transaction };

const notFound = () => new AppError("NOT_FOUND", "No such catalog item.");

function toEquipmentDto(row: Equipment): EquipmentDto {
  // Parsed again on the way out, so the design review never reads a figure the schema would refuse.
  const parsed = EquipmentInput.safeParse({ kind: row.kind, maker: row.maker, model: row.model, listing: row.listing, specs: row.specs });
  if (!parsed.success) throw new Error(`Catalog item ${row.id} holds specifications the schema refuses: ${parsed.error.message}`);
  const hasDatasheet = row.datasheetKey && row.datasheetFileName && row.datasheetUploadedAt;
  return {
    ...parsed.data,
    id: row.id,
    isArchived: row.isArchived,
    datasheet: hasDatasheet
      ? { fileName: row.datasheetFileName!, sizeBytes: row.datasheetSizeBytes ?? 0, uploadedAt: row.datasheetUploadedAt!.toISOString() }
      : null,
  };
}

function assertCanEdit(viewer: Viewer) {
  if (!can(viewer, "catalog:edit")) throw new AppError("FORBIDDEN", "Only admins can change the equipment catalog.");
}

async function findOwnEquipment(
  viewer: Viewer,
  equipmentId: string,
  { transaction, forUpdate = false }: WithTransaction & { forUpdate?: boolean } = {},
) {
  // A malformed id is just another item the viewer cannot see.
  if (!isUuid(equipmentId)) throw notFound();
  const row = await Equipment.findOne({
    where: { id: equipmentId, organizationId: viewer.organizationId },
    transaction,
    lock: forUpdate ? transaction?.LOCK.UPDATE : undefined,
  });
  if (!row) throw notFound();
  return row;
}

/** Turns the unique index's refusal into a message next to the model field. */
async function refusingDuplicates<T>(values: EquipmentValues, work: () => Promise<T>): Promise<T> {
  try {
    return await work();
  } catch (error) {
    if (!(error instanceof UniqueConstraintError)) throw error;
    throw new AppError("CONFLICT", `${values.maker} ${values.model} is already in the catalog (${EQUIPMENT_KIND_LABELS[values.kind]}).`, {
      model: ["Already in the catalog"],
    });
  }
}

const auditFields = ({ maker, model, listing, specs }: Pick<EquipmentValues, "maker" | "model" | "listing" | "specs">) => ({
  maker,
  model,
  listing,
  specs,
});

/**
 * The viewer's organization's catalog, by kind, maker and model; archived items only when asked.
 * Callers check "catalog:view"; the design editor reads through here too.
 */
export async function listEquipment({
  viewer,
  kind,
  includeArchived = false,
  transaction,
}: { viewer: Viewer; kind?: EquipmentKind; includeArchived?: boolean } & WithTransaction): Promise<EquipmentDto[]> {
  db();
  const rows = await Equipment.findAll({
    where: { organizationId: viewer.organizationId, ...(kind ? { kind } : {}), ...(includeArchived ? {} : { isArchived: false }) },
    order: [
      ["kind", "ASC"],
      ["maker", "ASC"],
      ["model", "ASC"],
    ],
    transaction,
  });
  return rows.map(toEquipmentDto);
}

/** One catalog item, archived or not; NOT_FOUND for missing and foreign ids alike. */
export async function getEquipmentById({
  viewer,
  equipmentId,
  transaction,
}: { viewer: Viewer; equipmentId: string } & WithTransaction): Promise<EquipmentDto> {
  db();
  return toEquipmentDto(await findOwnEquipment(viewer, equipmentId, { transaction }));
}

/**
 * The catalog items a design refers to, in the order asked and once each; archived ones too,
 * because saved designs may still use them. Missing, malformed and other organizations' ids
 * are left out alike, so the caller reports them as "not chosen" and learns nothing more.
 */
export async function getEquipmentByIds({
  viewer,
  ids,
  transaction,
}: { viewer: Viewer; ids: readonly string[] } & WithTransaction): Promise<EquipmentDto[]> {
  db();
  const wanted = [...new Set(ids.map((id) => id.toLowerCase()))].filter(isUuid);
  if (wanted.length === 0) return [];
  const rows = await Equipment.findAll({ where: { organizationId: viewer.organizationId, id: { [Op.in]: wanted } }, transaction });
  const byId = new Map(rows.map((row) => [row.id, row]));
  return wanted.flatMap((id) => {
    const row = byId.get(id);
    return row ? [toEquipmentDto(row)] : [];
  });
}

/** Adds an item to the viewer's catalog (admins); CONFLICT when the maker and model of that kind exist already. */
export async function createEquipment({ viewer, values }: { viewer: Viewer; values: EquipmentValues }): Promise<EquipmentDto> {
  assertCanEdit(viewer);
  const { kind, maker, model, listing, specs } = values;
  const row = await refusingDuplicates(values, () =>
    writeWithAudit({ viewer, action: "equipment.created", entityType: "equipment" }, async (transaction) => ({
      row: await Equipment.create({ organizationId: viewer.organizationId, kind, maker, model, listing, specs }, { transaction }),
      changes: diffFields({}, { kind, ...auditFields(values) }),
    })),
  );
  return toEquipmentDto(row);
}

/** Replaces an item's maker, model, listing and figures. Its kind stays: designs refer to it as that kind. */
export async function updateEquipment({
  viewer,
  equipmentId,
  values,
}: {
  viewer: Viewer;
  equipmentId: string;
  values: EquipmentValues;
}): Promise<EquipmentDto> {
  assertCanEdit(viewer);
  const row = await refusingDuplicates(values, () =>
    writeWithAudit({ viewer, action: "equipment.updated", entityType: "equipment" }, async (transaction) => {
      const found = await findOwnEquipment(viewer, equipmentId, { transaction, forUpdate: true });
      if (found.kind !== values.kind)
        throw new AppError("INVALID_INPUT", "A catalog item keeps its kind; add a new item instead.", {
          kind: [`Cannot change from ${EQUIPMENT_KIND_LABELS[found.kind]}`],
        });
      const changes = diffFields(
        auditFields({ ...found.get({ plain: true }), specs: found.specs as EquipmentValues["specs"] }),
        auditFields(values),
      );
      return { row: await found.update(auditFields(values), { transaction }), changes };
    }),
  );
  return toEquipmentDto(row);
}

/** Archived items leave the pickers of new designs but stay readable for saved ones. */
export async function setEquipmentArchived({
  viewer,
  equipmentId,
  isArchived,
}: {
  viewer: Viewer;
  equipmentId: string;
  isArchived: boolean;
}): Promise<EquipmentDto> {
  assertCanEdit(viewer);
  const row = await writeWithAudit(
    { viewer, action: isArchived ? "equipment.archived" : "equipment.restored", entityType: "equipment" },
    async (transaction) => {
      const found = await findOwnEquipment(viewer, equipmentId, { transaction, forUpdate: true });
      const changes = { isArchived: { before: found.isArchived, after: isArchived } };
      return { row: await found.update({ isArchived }, { transaction }), changes };
    },
  );
  return toEquipmentDto(row);
}

function assertPdf(fileName: string, bytes: Uint8Array) {
  const name = DatasheetFileName.safeParse(fileName);
  if (!name.success) throw new AppError("INVALID_INPUT", name.error.issues[0].message, { file: [name.error.issues[0].message] });
  const problem =
    bytes.byteLength === 0
      ? "The file is empty."
      : bytes.byteLength > DATASHEET_MAX_BYTES
        ? `The file is larger than ${DATASHEET_MAX_BYTES / 1024 / 1024} MB.`
        : // Every PDF starts with this marker; the name alone proves nothing.
          new TextDecoder().decode(bytes.subarray(0, 5)) !== "%PDF-"
          ? "The file is not a PDF."
          : null;
  if (problem) throw new AppError("INVALID_INPUT", problem, { file: [problem] });
}

/** Keeps file names printable in a download header. */
const safeFileName = (fileName: string) => fileName.trim().replace(/[^\w .()-]+/g, "_");

/**
 * Stores a PDF data sheet for a catalog item (admins) under a key the server makes, and
 * replaces the previous one. The row and its audit event commit together; the object
 * of a failed commit is removed again.
 */
export async function attachDatasheet({
  viewer,
  equipmentId,
  fileName,
  bytes,
}: {
  viewer: Viewer;
  equipmentId: string;
  fileName: string;
  bytes: Uint8Array;
}): Promise<EquipmentDto> {
  db();
  assertCanEdit(viewer);
  assertPdf(fileName, bytes);
  await findOwnEquipment(viewer, equipmentId);
  const key = `orgs/${viewer.organizationId}/datasheets/${equipmentId.toLowerCase()}/${randomUUID()}.pdf`;
  const name = safeFileName(fileName);
  await putObject({ key, body: bytes, contentType: "application/pdf" });
  let previousKey: string | null = null;
  const row = await writeWithAudit({ viewer, action: "equipment.datasheet-attached", entityType: "equipment" }, async (transaction) => {
    const found = await findOwnEquipment(viewer, equipmentId, { transaction, forUpdate: true });
    previousKey = found.datasheetKey;
    const changes = { datasheet: { before: found.datasheetFileName, after: name } };
    return {
      row: await found.update(
        { datasheetKey: key, datasheetFileName: name, datasheetSizeBytes: bytes.byteLength, datasheetUploadedAt: new Date() },
        { transaction },
      ),
      changes,
    };
  }).catch(async (error: unknown) => {
    await deleteObject(key).catch(() => undefined);
    throw error;
  });
  // A leftover object costs storage, not correctness: log it and carry on.
  if (previousKey)
    await deleteObject(previousKey).catch((error: unknown) => console.error("could not remove a replaced data sheet", previousKey, error));
  return toEquipmentDto(row);
}

/** Where an item's data sheet lives, for the authorized download route only; NOT_FOUND when there is none. */
export async function getDatasheetLocation({
  viewer,
  equipmentId,
}: {
  viewer: Viewer;
  equipmentId: string;
}): Promise<{ key: string; fileName: string }> {
  db();
  const row = await findOwnEquipment(viewer, equipmentId);
  if (!row.datasheetKey) throw new AppError("NOT_FOUND", "This catalog item has no data sheet yet.");
  return { key: row.datasheetKey, fileName: row.datasheetFileName ?? "datasheet.pdf" };
}
