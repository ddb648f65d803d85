"use client";

import { createContext, useContext, type ReactNode } from "react";
import { DEFAULT_TIME_ZONE, formatInZone, type TimeStyle } from "@/lib/domain/time-zones";

const TimeZoneContext = createContext<string>(DEFAULT_TIME_ZONE);

/** Gives every time on the page the organization's zone (Settings → Organization). */
export function TimeZoneProvider({ timeZone, children }: { timeZone: string; children: ReactNode }) {
  return <TimeZoneContext.Provider value={timeZone}>{children}</TimeZoneContext.Provider>;
}

export function useTimeZone(): string {
  return useContext(TimeZoneContext);
}

/** A moment shown in the organization's zone, with the machine-readable value kept in the markup. */
export function LocalTime({ iso, style = "datetime" }: { iso: string; style?: TimeStyle }) {
  const timeZone = useTimeZone();
  return <time dateTime={iso}>{formatInZone(iso, timeZone, style)}</time>;
}
