import { z } from "zod";
import { requiredText, safeString } from "./fields";

/** An admin names a token after the integration that will hold it. */
export const CreateApiTokenInput = z.object({ name: requiredText("token name", 60) });
export type CreateApiTokenInput = z.infer<typeof CreateApiTokenInput>;

export const RevokeApiTokenInput = z.object({ apiTokenId: safeString().uuid("Unknown API token") });
