"use server";

import { defineAction } from "@/lib/server/action";
import { acceptInvitation } from "@/lib/server/data/users";
import { SetPasswordInput } from "@/lib/schemas/user";

/** Public by design: the invitation token is the credential. */
export const acceptInvitationAction = defineAction({ schema: SetPasswordInput, permission: null }, async (input) =>
  acceptInvitation({ token: input.token, password: input.password }),
);
