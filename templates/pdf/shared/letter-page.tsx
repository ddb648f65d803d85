import { Page, StyleSheet, View } from "@react-pdf/renderer";
import type { ReactNode } from "react";
import { SheetHeading } from "./sheet-page";
import { FORM_PAGE, base } from "./styles";

// A US letter page for documents that flow over as many pages as their content needs
// (reports, certificates, receipts): the heading opens page 1 and a footer repeats at the
// foot of every page. The footer is page chrome (react-pdf's page layout), so its height
// is reserved on every page however tall it turns out.

const s = StyleSheet.create({
  page: { padding: FORM_PAGE.marginPt, paddingBottom: 28, fontSize: 9 },
  frame: { flexGrow: 1, flexDirection: "column" },
  content: { flexGrow: 1, flexShrink: 1 },
  footer: { marginTop: 10 },
});

/** Which page of how many: known per page once the document is laid out. */
export type PageCount = { pageNumber: number; totalPages: number };

type LetterPageProps = {
  title: string;
  subtitle?: string;
  /** Printed at the foot of every page. */
  footer: (count: PageCount) => ReactNode;
  children: ReactNode;
};

export function LetterPage({ title, subtitle, footer, children }: LetterPageProps) {
  return (
    <Page
      size={FORM_PAGE.size}
      orientation={FORM_PAGE.orientation}
      style={[base.page, s.page]}
      layout={({ children: content, pageNumber = 1, totalPages = 1 }) => (
        <View style={s.frame}>
          <View style={s.content}>{content}</View>
          <View style={s.footer}>{footer({ pageNumber, totalPages })}</View>
        </View>
      )}
    >
      <SheetHeading title={title} subtitle={subtitle} form />
      {children}
    </Page>
  );
}
