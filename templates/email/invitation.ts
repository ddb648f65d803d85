import { renderEmail } from "./layout";

export function invitationEmail({
  name,
  organizationName,
  inviterName,
  url,
  days,
}: {
  name: string;
  organizationName: string;
  inviterName: string;
  url: string;
  days: number;
}) {
  const subject = `You are invited to ${organizationName} on Ohmstead`;
  const body = renderEmail({
    paragraphs: [
      `Hello ${name},`,
      `${inviterName} added you to ${organizationName} on Ohmstead, where the team keeps each solar project's design, permit and utility paperwork.`,
      `Choose a password with the link below. It works once and expires in ${days} days.`,
    ],
    action: { label: "Set your password", url },
  });
  return { subject, ...body };
}
