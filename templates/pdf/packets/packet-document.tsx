import { Document } from "@react-pdf/renderer";
import type { ReactNode } from "react";
import { PACKET_TITLES, type PacketInput } from "@/lib/documents/packets/input";
import { projectLabel, revisionLabel } from "@/lib/documents/packets/facts";

/** The metadata a reviewer's PDF viewer shows for a packet. */
export function packetDocumentInfo(input: PacketInput) {
  return { title: `${PACKET_TITLES[input.kind]}, ${projectLabel(input)}, ${revisionLabel(input.revision)}`, author: input.preparedBy.organizationName, creator: "Ohmstead", producer: "Ohmstead" };
}

/** The PDF document around a packet's sheets, with the metadata a reviewer's viewer shows. */
export function PacketDocument({ input, children }: { input: PacketInput; children: ReactNode }) {
  return <Document {...packetDocumentInfo(input)}>{children}</Document>;
}
