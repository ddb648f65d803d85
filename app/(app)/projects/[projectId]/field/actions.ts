"use server";

import { SaveCommissioningInput } from "@/lib/schemas/commissioning";
import { defineAction } from "@/lib/server/action";
import { saveCommissioning } from "@/lib/server/data/commissioning";

export const saveCommissioningAction = defineAction(
  { schema: SaveCommissioningInput, permission: "field:record" },
  async (input, { viewer }) => {
    const saved = await saveCommissioning({ viewer, input });
    return {
      status: saved.status,
      updatedAt: saved.updatedAt,
      completedAt: saved.completedAt,
      completion: saved.completion,
      completeRefused: saved.completeRefused,
    };
  },
);
