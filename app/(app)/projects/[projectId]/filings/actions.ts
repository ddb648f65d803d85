"use server";

import { revalidatePath } from "next/cache";
import { defineAction } from "@/lib/server/action";
import {
  addFiling,
  answerFilingItem,
  attachRoundLetter,
  changeFilingStatus,
  recordCorrectionRound,
  recordInspectionResult,
  recordPto,
  scheduleInspection,
  updateFilingDetails,
} from "@/lib/server/data/filings";
import {
  AddFilingInput,
  AnswerItemInput,
  AttachLetterInput,
  ChangeFilingStatusInput,
  FilingDetailsInput,
  InspectionResultInput,
  RecordPtoInput,
  RecordRoundInput,
  ScheduleInspectionInput,
} from "@/lib/schemas/filings";

// Every filing change refreshes the project's pages: its stage and waiting-on may have moved.
const refresh = () => revalidatePath("/projects/[projectId]", "layout");

export const changeFilingStatusAction = defineAction(
  { schema: ChangeFilingStatusInput, permission: "filings:edit" },
  async (input, { viewer }) => {
    await changeFilingStatus({ viewer, input });
    refresh();
    return { status: input.status };
  },
);

export const updateFilingDetailsAction = defineAction(
  { schema: FilingDetailsInput, permission: "filings:edit" },
  async (input, { viewer }) => {
    await updateFilingDetails({ viewer, input });
    refresh();
    return { filingId: input.filingId };
  },
);

export const addFilingAction = defineAction({ schema: AddFilingInput, permission: "filings:edit" }, async (input, { viewer }) => {
  const added = await addFiling({ viewer, input });
  refresh();
  return added;
});

export const attachLetterAction = defineAction({ schema: AttachLetterInput, permission: "filings:edit" }, async (input, { viewer }) => {
  await attachRoundLetter({ viewer, input });
  refresh();
  return { roundId: input.roundId };
});

export const recordRoundAction = defineAction({ schema: RecordRoundInput, permission: "filings:edit" }, async (input, { viewer }) => {
  const round = await recordCorrectionRound({ viewer, input });
  refresh();
  return round;
});

export const answerItemAction = defineAction({ schema: AnswerItemInput, permission: "filings:edit" }, async (input, { viewer }) => {
  await answerFilingItem({ viewer, input });
  refresh();
  return { itemId: input.itemId };
});

export const scheduleInspectionAction = defineAction(
  { schema: ScheduleInspectionInput, permission: "filings:edit" },
  async (input, { viewer }) => {
    const booked = await scheduleInspection({ viewer, input });
    refresh();
    return booked;
  },
);

export const recordInspectionResultAction = defineAction(
  { schema: InspectionResultInput, permission: "filings:edit" },
  async (input, { viewer }) => {
    await recordInspectionResult({ viewer, input });
    refresh();
    return { inspectionId: input.inspectionId };
  },
);

export const recordPtoAction = defineAction({ schema: RecordPtoInput, permission: "filings:edit" }, async (input, { viewer }) => {
  await recordPto({ viewer, input });
  refresh();
  return { ptoOn: input.ptoOn };
});
