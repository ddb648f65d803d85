import type { Metadata } from "next";
import { AuthorityEditPage } from "../../_components/authority-pages";

export const metadata: Metadata = { title: "Edit jurisdiction" };

export default async function Page({ params }: { params: Promise<{ jurisdictionId: string }> }) {
  return <AuthorityEditPage kind="jurisdiction" authorityId={(await params).jurisdictionId} />;
}
