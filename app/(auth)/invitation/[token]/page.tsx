import type { Metadata } from "next";
import Link from "next/link";
import { getInvitationByToken } from "@/lib/server/data/users";
import { SetPasswordForm } from "./_components/set-password-form";
import { acceptInvitationAction } from "./actions";

export const metadata: Metadata = { title: "Set your password", robots: { index: false } };

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invitation = token.length <= 200 ? await getInvitationByToken(token) : null;
  if (!invitation) {
    return (
      <>
        <h1 className="mb-2 text-xl">Link not valid</h1>
        <p className="text-sm text-ink-soft">
          This invitation link has been used or has expired. Ask your organization&apos;s admin to send a new one.
        </p>
        <p className="mt-4 text-sm">
          <Link href="/sign-in">Go to sign-in</Link>
        </p>
      </>
    );
  }
  if (invitation.clash) {
    return (
      <>
        <h1 className="mb-2 text-xl">This address already has an account</h1>
        <p className="text-sm text-ink-soft" data-testid="invitation-clash">
          {invitation.clash}
        </p>
        <p className="mt-4 text-sm">
          <Link href="/sign-in">Go to sign-in</Link>
        </p>
      </>
    );
  }
  return (
    <>
      <h1 className="mb-1 text-xl">Welcome, {invitation.name}</h1>
      <p className="mb-4 text-sm text-ink-soft">
        Choose a password for <span className="measure">{invitation.email}</span> at {invitation.organizationName}.
      </p>
      <SetPasswordForm accept={acceptInvitationAction} token={token} email={invitation.email} />
    </>
  );
}
