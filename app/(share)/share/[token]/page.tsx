import type { Metadata } from "next";
import { headers } from "next/headers";
import { notFound, redirect } from "next/navigation";
import { isAppError } from "@/lib/errors";
import { openShareLink, type SharedView } from "@/lib/server/data/share-links";
import { clientOf } from "@/lib/server/share-http";
import { SharedPacketView } from "./_components/shared-packet-view";

export const metadata: Metadata = { title: "Shared packet", robots: { index: false, follow: false, nocache: true } };

// The inspector's read-only page: the token is the only key, there is no session.
export default async function SharedPacketPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  let view: SharedView;
  try {
    view = await openShareLink(token, clientOf(await headers()));
  } catch (error) {
    if (!isAppError(error)) throw error;
    if (error.code === "NOT_FOUND") notFound();
    // Pages cannot answer 410 or 429 themselves; this route handler does, with the reason.
    redirect(`/share/${encodeURIComponent(token)}/gone`);
  }
  return <SharedPacketView token={token} view={view} />;
}
