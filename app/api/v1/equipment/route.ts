import { NextResponse } from "next/server";
import { createEquipment, listEquipment } from "@/lib/server/data/equipment";
import { readJson, withAuth } from "@/lib/server/http";
import { EquipmentInput, EquipmentListQuery } from "@/lib/schemas/equipment";

// GET /api/v1/equipment – the organization's catalog, optionally one kind (?kind=module) and with archived items (?includeArchived=true)
export const GET = withAuth(
  async (request, { viewer }) => {
    const { kind, includeArchived } = EquipmentListQuery.parse(Object.fromEntries(request.nextUrl.searchParams));
    return NextResponse.json({ items: await listEquipment({ viewer, kind, includeArchived }) });
  },
  { permission: "catalog:view" },
);

// POST /api/v1/equipment – add a module, inverter or module-level device to the catalog
export const POST = withAuth(
  async (request, { viewer }) => {
    const values = EquipmentInput.parse(await readJson(request));
    return NextResponse.json(await createEquipment({ viewer, values }), { status: 201 });
  },
  { permission: "catalog:edit" },
);
