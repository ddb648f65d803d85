"use client";

import dynamic from "next/dynamic";

// The fee schedule sits below the authority's own form: its editor and fee preview arrive after the
// page, so an AHJ's or a utility's settings page loads no more script than its form needs.
export const FeeScheduleEditor = dynamic(() => import("./fee-schedule-editor").then((m) => m.FeeScheduleEditor));
