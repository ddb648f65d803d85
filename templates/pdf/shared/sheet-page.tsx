import { Page, StyleSheet, Text, View } from "@react-pdf/renderer";
import type { ReactNode } from "react";
import type { PrintedPacket } from "@/lib/documents/packets/printed";
import { COLORS, FORM_PAGE, PLAN_PAGE, base } from "./styles";
import { TitleBlock, type SheetInfo } from "./title-block";

const s = StyleSheet.create({
  planPage: { padding: PLAN_PAGE.marginPt, fontSize: 8 },
  frame: { flexGrow: 1, borderWidth: 1.2, borderColor: COLORS.ink, flexDirection: "column" },
  planBody: { flexGrow: 1, flexShrink: 1, paddingHorizontal: 16, paddingTop: 12, paddingBottom: 8 },
  formPage: { padding: FORM_PAGE.marginPt, paddingBottom: 28, fontSize: 9 },
  formBody: { flexGrow: 1, flexShrink: 1, paddingBottom: 10 },
  heading: {
    flexDirection: "row",
    alignItems: "flex-end",
    justifyContent: "space-between",
    marginBottom: 10,
    paddingBottom: 5,
    borderBottomWidth: 2,
    borderBottomColor: COLORS.copper,
  },
  title: { fontSize: 16, fontWeight: 700 },
  formTitle: { fontSize: 14, fontWeight: 700 },
  subtitle: { fontSize: 8, color: COLORS.inkSoft, maxWidth: "55%", textAlign: "right" },
});

type SheetProps = { input: PrintedPacket; sheet: SheetInfo; subtitle?: string; children: ReactNode };

/** A sheet's or document's title over a copper rule, with an optional note on the right. */
export function SheetHeading({ title, subtitle, form }: { title: string; subtitle?: string; form: boolean }) {
  return (
    <View style={s.heading} wrap={false}>
      <Text style={form ? s.formTitle : s.title}>{title}</Text>
      {subtitle ? <Text style={s.subtitle}>{subtitle}</Text> : null}
    </View>
  );
}

/** A plan sheet: 11 × 17 landscape, drawn inside a border with the title block along its foot. */
export function PlanSheet({ input, sheet, subtitle, children }: SheetProps) {
  return (
    <Page size={PLAN_PAGE.size} orientation={PLAN_PAGE.orientation} style={[base.page, s.planPage]}>
      <View style={s.frame}>
        <View style={s.planBody}>
          <SheetHeading title={sheet.title} subtitle={subtitle} form={false} />
          {children}
        </View>
        <TitleBlock input={input} sheet={sheet} />
      </View>
    </Page>
  );
}

/** A form page: US letter portrait with the compact title block at the foot. */
export function FormSheet({ input, sheet, subtitle, children }: SheetProps) {
  return (
    <Page size={FORM_PAGE.size} orientation={FORM_PAGE.orientation} style={[base.page, s.formPage]}>
      <View style={s.formBody}>
        <SheetHeading title={sheet.title} subtitle={subtitle} form />
        {children}
      </View>
      <TitleBlock input={input} sheet={sheet} compact />
    </Page>
  );
}
