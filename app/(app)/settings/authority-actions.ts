"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { AUTHORITY_SPECS } from "@/lib/authorities/specs";
import { AUTHORITY_KINDS } from "@/lib/domain/authorities";
import { AppError } from "@/lib/errors";
import { defineAction, fieldErrorsOf } from "@/lib/server/action";
import { saveAuthority, type AuthorityValues } from "@/lib/server/data/authorities";
import { safeString } from "@/lib/schemas/fields";

const SaveAuthorityInput = z.object({
  kind: z.enum(AUTHORITY_KINDS),
  authorityId: safeString().uuid("Unknown authority").optional(),
  values: z.unknown(),
});

/** Adds or changes an AHJ or a utility; the values are parsed with the kind's own schema, their errors keyed by field. */
export const saveAuthorityAction = defineAction(
  { schema: SaveAuthorityInput, permission: "reference:edit" },
  async ({ kind, authorityId, values }, { viewer }) => {
    const spec = AUTHORITY_SPECS[kind];
    const parsed = spec.schema.safeParse(values);
    if (!parsed.success) throw new AppError("INVALID_INPUT", "Check the highlighted fields.", fieldErrorsOf(parsed.error));
    const saved = await saveAuthority({ viewer, kind, authorityId, values: parsed.data as AuthorityValues<typeof kind> });
    revalidatePath(spec.path);
    return { id: saved.id };
  },
);
