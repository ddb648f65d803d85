import { StyleSheet, Text, View } from "@react-pdf/renderer";
import type { PrintedPacket } from "@/lib/documents/packets/printed";
import { NumberedList, Section } from "../../shared/blocks";
import { FormSheet } from "../../shared/sheet-page";
import { SIGNATURE_FIELDS, SignatureLine, SignatureRow, signedDateField } from "../../shared/signature-line";
import { COLORS, base } from "../../shared/styles";
import type { SheetInfo } from "../../shared/title-block";

const s = StyleSheet.create({
  block: { marginTop: 14, padding: 10, borderWidth: 0.8, borderColor: COLORS.rule },
  blockTitle: { fontSize: 10, fontWeight: 700, marginBottom: 2 },
});

function SignatureBlock({ title, who, name, field }: { title: string; who: string; name: string; field: string }) {
  return (
    <View style={s.block} wrap={false}>
      <Text style={s.blockTitle}>{title}</Text>
      <Text style={[base.soft, { fontSize: 8 }]}>{who}</Text>
      <SignatureRow>
        <SignatureLine caption="Signature" flex={2} field={field} />
        <SignatureLine caption="Date" field={signedDateField(field)} />
      </SignatureRow>
      <SignatureRow>
        <SignatureLine caption="Printed name" flex={2} prefill={name} />
        <SignatureLine caption="Title or role" />
      </SignatureRow>
    </View>
  );
}

/** The last page: what each party confirms, and lines to sign. */
export function SignatureSheet({ input, sheet }: { input: PrintedPacket; sheet: SheetInfo }) {
  const utility = input.utility?.name ?? "the utility";
  return (
    <FormSheet input={input} sheet={sheet}>
      <Section title="What the signatures confirm">
        <NumberedList
          fontSize={8.5}
          items={[
            `The customer asks ${utility} to connect the system described in this application at the service address given, and confirms they hold the utility account named.`,
            "The installer confirms the information in this application matches the system design of this revision, and that the system will be built to the NEC and local amendments the AHJ enforces and to the utility's requirements.",
            "The system will not be switched on to run in parallel with the grid until the AHJ's final inspection has passed and the utility has granted permission to operate (PTO), apart from any test the utility allows.",
            "The inverters will be set to the grid profile the utility requires; changes to the system or its settings after approval will be reported to the utility first.",
          ]}
        />
      </Section>
      <SignatureBlock
        title="Customer"
        field={SIGNATURE_FIELDS.customer}
        who={`Account holder at ${input.project.street}, ${input.project.city}`}
        name={input.project.customerName}
      />
      <SignatureBlock
        title="Installer"
        field={SIGNATURE_FIELDS.installer}
        who={`${input.preparedBy.organizationName}${input.preparedBy.licenseNumber ? `, license ${input.preparedBy.licenseNumber}` : ""}`}
        name={input.preparedBy.name}
      />
    </FormSheet>
  );
}
