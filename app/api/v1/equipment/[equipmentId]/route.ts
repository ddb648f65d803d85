import { NextResponse } from "next/server";
import { getEquipmentById, updateEquipment } from "@/lib/server/data/equipment";
import { readJson, withAuth } from "@/lib/server/http";
import { EquipmentInput } from "@/lib/schemas/equipment";

type Params = { equipmentId: string };

// GET /api/v1/equipment/:equipmentId – one catalog item (404 for missing and foreign alike)
export const GET = withAuth<Params>(
  async (_request, { viewer, params }) => NextResponse.json(await getEquipmentById({ viewer, equipmentId: params.equipmentId })),
  { permission: "catalog:view" },
);

// PUT /api/v1/equipment/:equipmentId – replace the item's maker, model, listing and figures (its kind stays)
export const PUT = withAuth<Params>(
  async (request, { viewer, params }) => {
    const values = EquipmentInput.parse(await readJson(request));
    return NextResponse.json(await updateEquipment({ viewer, equipmentId: params.equipmentId, values }));
  },
  { permission: "catalog:edit" },
);
