import type { Metadata } from "next";
import { SignOutButton } from "@/components/auth/sign-out-button";

export const metadata: Metadata = { title: "Sign out" };

export default function SignOutPage() {
  return (
    <>
      <h1 className="mb-2 text-xl">Sign out</h1>
      <p className="mb-6 text-sm text-ink-soft">You will need your e-mail address and password to come back.</p>
      <SignOutButton />
    </>
  );
}
