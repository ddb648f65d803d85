import { Document } from "@react-pdf/renderer";
import type { ReactNode } from "react";
import type { PacketFacts } from "@/lib/documents/packets/printed";

/** The PDF document around a packet's sheets, with the metadata a reviewer's viewer shows. */
export function PacketDocument({ info, children }: { info: PacketFacts["documentInfo"]; children?: ReactNode }) {
  return <Document {...info}>{children}</Document>;
}
