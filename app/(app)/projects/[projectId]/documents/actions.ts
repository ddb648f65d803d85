"use server";

import { z } from "zod";
import { defineAction } from "@/lib/server/action";
import { requestPacket, retryPacket } from "@/lib/server/data/packets";
import { RequestPacketInput } from "@/lib/schemas/packet";

export const requestPacketAction = defineAction(
  { schema: RequestPacketInput.extend({ projectId: z.string().uuid() }), permission: "project:edit" },
  async ({ projectId, kind, overrideReason }, { viewer }) => requestPacket({ viewer, projectId, kind, overrideReason }),
);

export const retryPacketAction = defineAction(
  { schema: z.object({ packetId: z.string().uuid() }), permission: "project:edit" },
  async ({ packetId }, { viewer }) => retryPacket({ viewer, packetId }),
);
