// Inspections as iCalendar (RFC 5545) events, for a one-off download and for each person's feed.
import { createEvents, type DateArray, type EventAttributes } from "ics";
import { INSPECTION_KIND_LABELS, INSPECTION_RESULT_LABELS, type InspectionKind, type InspectionResult } from "@/lib/domain/filings";
import { addCalendarDays } from "@/lib/domain/time-zones";

export const CALENDAR_PRODUCT_ID = "-//Ohmstead//Inspections//EN";

/** An inspection as a calendar shows it. `day` is the organization's calendar day (YYYY-MM-DD). */
export type InspectionEvent = {
  inspectionId: string;
  kind: InspectionKind;
  day: string;
  timeWindow: string;
  inspectorName: string;
  result: InspectionResult | null;
  authorityName: string;
  projectNumber: number;
  customerName: string;
  siteAddress: string;
  filingUrl: string;
  updatedAt: string;
};

const dateArray = (day: string): DateArray => day.split("-").map(Number) as DateArray;

function toAttributes(e: InspectionEvent): EventAttributes {
  const details = [
    `${INSPECTION_KIND_LABELS[e.kind]} by ${e.authorityName} for project ${e.projectNumber} (${e.customerName}).`,
    e.timeWindow ? `Window: ${e.timeWindow}.` : "Window not given: check with the authority.",
    e.inspectorName ? `Inspector: ${e.inspectorName}.` : "",
    e.result ? `Result: ${INSPECTION_RESULT_LABELS[e.result]}.` : "",
    `Filing: ${e.filingUrl}`,
  ].filter(Boolean);
  return {
    // The booked window is free text, so the event is the whole day and the window goes in the title.
    start: dateArray(e.day),
    end: dateArray(addCalendarDays(e.day, 1)),
    title: `${INSPECTION_KIND_LABELS[e.kind]}${e.timeWindow ? ` ${e.timeWindow}` : ""} · Project ${e.projectNumber} · ${e.customerName}`,
    description: details.join("\n"),
    location: e.siteAddress,
    url: e.filingUrl,
    uid: `inspection-${e.inspectionId}@ohmstead`,
    status: e.result === "cancelled" ? "CANCELLED" : "CONFIRMED",
    busyStatus: "FREE",
    transp: "TRANSPARENT",
    lastModified: Date.parse(e.updatedAt),
  };
}

/** A VCALENDAR with one VEVENT per inspection (none is still a valid, empty calendar). */
export function inspectionsCalendar(events: readonly InspectionEvent[], calName: string): string {
  const { error, value } = createEvents(events.map(toAttributes), { productId: CALENDAR_PRODUCT_ID, calName });
  if (error || !value) throw error ?? new Error("The calendar could not be written.");
  return value;
}
