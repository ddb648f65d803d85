import "server-only";
import { User } from "@/models";
import type { Viewer } from "@/lib/domain/permissions";
import { db } from "../db";
import { listAuthorities } from "./authorities";

export type { JurisdictionDto, UtilityDto } from "./authorities";

type Option = { id: string; name: string };

/** The choices of the project form, all from the viewer's organization. */
export async function getProjectFormOptions({ viewer }: { viewer: Viewer }) {
  db();
  const [jurisdictions, utilities, people] = await Promise.all([
    listAuthorities({ viewer, kind: "jurisdiction" }),
    listAuthorities({ viewer, kind: "utility" }),
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
