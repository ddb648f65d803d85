import "server-only";
import { cache } from "react";
import { Organization } from "@/models";
import { can, type Viewer } from "@/lib/domain/permissions";
import { AppError } from "@/lib/errors";
import type { OrganizationValues } from "@/lib/schemas/organization";
import { db } from "../db";
import { diffFields, recordAudit } from "./audit";
import type { OrganizationDto } from "@/lib/dto/organizations";

const toDto = ({ id, name, licenseNumber, phone, timeZone }: Organization): OrganizationDto => ({
  id,
  name,
  licenseNumber,
  phone,
  timeZone,
});

// Read once per request: the app layout (for the time zone) and the page both ask for it.
const loadOrganization = cache(async (organizationId: string): Promise<OrganizationDto> => {
  db();
  const row = await Organization.findByPk(organizationId);
  if (!row) throw new AppError("NOT_FOUND", "No such organization.");
  return toDto(row);
});

/** What a generated document prints of the company: its name, license, phone and the zone its times are in. */
export const documentOrganization = ({ name, licenseNumber, phone, timeZone }: OrganizationDto) => ({
  name,
  licenseNumber,
  phone,
  timeZone,
});

/** The viewer's own organization. */
export function getOrganization({ viewer }: { viewer: Viewer }): Promise<OrganizationDto> {
  return loadOrganization(viewer.organizationId);
}

/** Changes the company's printed details; the audit trail keeps what changed. */
export async function updateOrganization({ viewer, values }: { viewer: Viewer; values: OrganizationValues }): Promise<OrganizationDto> {
  if (!can(viewer, "organization:edit")) throw new AppError("FORBIDDEN", "Only an admin can change the organization.");
  const sequelize = db();
  return sequelize.transaction(async (transaction) => {
    const row = await Organization.findByPk(viewer.organizationId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!row) throw new AppError("NOT_FOUND", "No such organization.");
    const changes = diffFields(toDto(row), values);
    await row.update(values, { transaction });
    if (Object.keys(changes).length)
      await recordAudit({ viewer, action: "organization.updated", entityType: "organization", entityId: row.id, changes }, { transaction });
    return toDto(row);
  });
}
