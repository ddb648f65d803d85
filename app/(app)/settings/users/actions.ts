"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { defineAction } from "@/lib/server/action";
import { inviteUser, renewInvitation, setUserActive, updateUserRole } from "@/lib/server/data/users";
import { ChangeRoleInput, InviteUserInput, SetActiveInput } from "@/lib/schemas/user";

export const inviteUserAction = defineAction({ schema: InviteUserInput, permission: "users:manage" }, async (input, { viewer }) => {
  const { user } = await inviteUser({ viewer, input });
  revalidatePath("/settings/users");
  return { email: user.email };
});

export const renewInvitationAction = defineAction(
  { schema: z.object({ userId: z.string().uuid() }), permission: "users:manage" },
  async ({ userId }, { viewer }) => {
    const { user } = await renewInvitation({ viewer, userId });
    return { email: user.email };
  },
);

export const changeRoleAction = defineAction(
  { schema: ChangeRoleInput, permission: "users:manage" },
  async ({ userId, role }, { viewer }) => {
    const user = await updateUserRole({ viewer, userId, role });
    revalidatePath("/settings/users");
    return user;
  },
);

export const setActiveAction = defineAction(
  { schema: SetActiveInput, permission: "users:manage" },
  async ({ userId, isActive }, { viewer }) => {
    const user = await setUserActive({ viewer, userId, isActive });
    revalidatePath("/settings/users");
    return user;
  },
);
