import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { sameOriginReturnPath } from "@/lib/net/return-path";
import { getViewer } from "@/lib/server/auth";
import { env } from "@/lib/server/env";
import { SignInForm } from "./_components/sign-in-form";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const params = await searchParams;
  const next = sameOriginReturnPath(params.callbackUrl, env().APP_URL);
  if (await getViewer()) redirect(next);
  const error = typeof params.error === "string" && params.error !== "CredentialsSignin" ? params.error : undefined;
  return (
    <>
      <h1 className="mb-4 text-xl">Sign in</h1>
      <SignInForm next={next} initialError={error} />
    </>
  );
}
