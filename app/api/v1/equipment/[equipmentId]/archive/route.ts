import { NextResponse } from "next/server";
import { setEquipmentArchived } from "@/lib/server/data/equipment";
import { readJson, withAuth } from "@/lib/server/http";
import { SetArchivedInput } from "@/lib/schemas/equipment";

const Body = SetArchivedInput.omit({ equipmentId: true }).strict();

// PUT /api/v1/equipment/:equipmentId/archive – archive ({ "isArchived": true }) or restore an item
export const PUT = withAuth<{ equipmentId: string }>(
  async (request, { viewer, params }) => {
    const { isArchived } = Body.parse(await readJson(request));
    return NextResponse.json(await setEquipmentArchived({ viewer, equipmentId: params.equipmentId, isArchived }));
  },
  { permission: "catalog:edit" },
);
