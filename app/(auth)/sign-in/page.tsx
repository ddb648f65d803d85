import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { getViewer } from "@/lib/server/auth";
import { SignInForm } from "./_components/sign-in-form";

export const metadata: Metadata = { title: "Sign in" };

/** Only same-site paths may follow a sign-in, never another host. */
function safeReturnPath(value: string | string[] | undefined): string {
  const v = Array.isArray(value) ? value[0] : value;
  return v && v.startsWith("/") && !v.startsWith("//") ? v : "/dashboard";
}

export default async function SignInPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const params = await searchParams;
  const next = safeReturnPath(params.callbackUrl);
  if (await getViewer()) redirect(next);
  const error = typeof params.error === "string" && params.error !== "CredentialsSignin" ? params.error : undefined;
  return (
    <>
      <h1 className="mb-4 text-xl">Sign in</h1>
      <SignInForm next={next} initialError={error} />
    </>
  );
}
