"use server";

import { z } from "zod";
import { defineAction } from "@/lib/server/action";
import { saveDesignDraft } from "@/lib/server/data/designs";

// The draft itself is checked by saveDesignDraft with the shared DesignDraft schema.
const SaveDesignInput = z.object({ projectId: z.string().uuid(), draft: z.record(z.string(), z.unknown()) });

export const saveDesignAction = defineAction(
  { schema: SaveDesignInput, permission: "project:edit" },
  async ({ projectId, draft }, { viewer }) => {
    const saved = await saveDesignDraft({ viewer, projectId, draft });
    return {
      revision: saved.revision,
      updatedAt: saved.updatedAt,
      status: saved.outcome.status === "reviewed" ? saved.outcome.review.summary.status : "incomplete",
    };
  },
);
