import type { Metadata } from "next";
import { AuthorityListPage } from "../_components/authority-pages";

export const metadata: Metadata = { title: "Jurisdictions" };

export default function Page() {
  return <AuthorityListPage kind="jurisdiction" />;
}
