import "server-only";
import type { Viewer } from "@/lib/domain/permissions";
import { invitationEmail } from "@/templates/email/invitation";
import { INVITATION_DAYS, type UserDto } from "../data/users";
import { env } from "../env";
import { sendMail } from "./mail";

/** E-mails the one-time set-password link; reports failure instead of throwing, since the user row is already saved. */
export async function sendInvitationEmail({ viewer, user, token, organizationName }: { viewer: Viewer; user: UserDto; token: string; organizationName: string }) {
  const url = `${env().APP_URL}/invitation/${token}`;
  const mail = invitationEmail({ name: user.name, organizationName, inviterName: viewer.name, url, days: INVITATION_DAYS });
  try {
    await sendMail({ to: user.email, ...mail });
    return { emailSent: true };
  } catch (error) {
    console.error("invitation e-mail failed", error);
    return { emailSent: false };
  }
}
