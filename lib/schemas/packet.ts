import { z } from "zod";
import { safeString } from "./fields";
import { PACKET_KINDS } from "@/lib/domain/stored-values";

export const RequestPacketInput = z.object({
  kind: z.enum(PACKET_KINDS, { error: "Choose the permit or the interconnection packet" }),
  overrideReason: safeString().trim().max(1000, "At most 1000 characters").optional(),
});
export type RequestPacketInput = z.infer<typeof RequestPacketInput>;
