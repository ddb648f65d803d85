import type { Metadata } from "next";
import { AuthorityListPage } from "../_components/authority-pages";

export const metadata: Metadata = { title: "Utilities" };

export default function Page() {
  return <AuthorityListPage kind="utility" />;
}
