import type { Metadata } from "next";
import { AuthorityEditPage } from "../../_components/authority-pages";

export const metadata: Metadata = { title: "Edit utility" };

export default async function Page({ params }: { params: Promise<{ utilityId: string }> }) {
  return <AuthorityEditPage kind="utility" authorityId={(await params).utilityId} />;
}
