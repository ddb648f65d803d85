import { z } from "zod";
import { safeString } from "./fields";
import { ROLES } from "@/lib/domain/roles";

export const RoleSchema = z.enum(ROLES, { error: "Choose admin, coordinator or installer" });

export const InviteUserInput = z.object({
  name: safeString().trim().min(2, "Enter the person's name").max(120, "At most 120 characters"),
  email: safeString().trim().toLowerCase().email("Enter a valid e-mail address").max(254, "At most 254 characters"),
  role: RoleSchema,
});
export type InviteUserInput = z.infer<typeof InviteUserInput>;

export const ChangeRoleInput = z.object({ userId: safeString().uuid("Unknown user"), role: RoleSchema });
export const SetActiveInput = z.object({ userId: safeString().uuid("Unknown user"), isActive: z.boolean() });

export const SetPasswordInput = z
  .object({
    token: safeString().min(20).max(200),
    password: safeString().min(10, "Use at least 10 characters").max(200, "At most 200 characters"),
    confirm: safeString(),
  })
  .refine((v) => v.password === v.confirm, { path: ["confirm"], message: "The two passwords differ" });
export type SetPasswordInput = z.infer<typeof SetPasswordInput>;
