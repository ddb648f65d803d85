import { z } from "zod";
import { SIGNED_DOCUMENT_KINDS, SIGNER_ROLES } from "@/lib/domain/stored-values";
import { SIGNING_LINK_DAYS } from "@/lib/domain/signature-requests";
import { safeString } from "./fields";

const email = safeString().trim().toLowerCase().max(254, "At most 254 characters").email("Enter an e-mail address");
const personName = safeString().trim().min(1, "Enter the name").max(200, "At most 200 characters");

/** One person asked to sign through their own link. */
export const LinkSignerInput = z.object({
  role: z.enum(SIGNER_ROLES),
  name: personName,
  email,
});

/** What a coordinator fills in to ask for signatures on one document. */
export const RequestSignaturesInput = z
  .object({
    document: z.enum(SIGNED_DOCUMENT_KINDS),
    packetId: safeString().uuid("Unknown packet").optional(),
    signers: z.array(LinkSignerInput).min(1, "Add at least one signer").max(3, "At most three signers"),
    expiresInDays: z.coerce
      .number({ error: "Enter a number of days" })
      .int("Whole days only")
      .min(SIGNING_LINK_DAYS.min, `At least ${SIGNING_LINK_DAYS.min} day`)
      .max(SIGNING_LINK_DAYS.max, `At most ${SIGNING_LINK_DAYS.max} days`)
      .default(SIGNING_LINK_DAYS.default),
  })
  .refine((v) => v.document !== "interconnection-application" || Boolean(v.packetId), {
    path: ["packetId"],
    message: "Choose the packet revision",
  })
  .refine((v) => new Set(v.signers.map((s) => s.role)).size === v.signers.length, {
    path: ["signers"],
    message: "Each block is signed by one person",
  });
export type RequestSignaturesInput = z.input<typeof RequestSignaturesInput>;

// A drawn signature arrives as the pad's PNG data URL; 400 kB of base64 is far more than a signature needs.
const PNG_DATA_URL = /^data:image\/png;base64,[A-Za-z0-9+/]+=*$/;
export const SignatureMarkInput = z.discriminatedUnion("kind", [
  z.object({
    kind: z.literal("drawn"),
    png: safeString().max(400_000, "The drawing is too large").regex(PNG_DATA_URL, "Draw your signature"),
  }),
  z.object({ kind: z.literal("typed"), name: personName }),
]);
export type SignatureMarkInput = z.infer<typeof SignatureMarkInput>;

/** What a signer sends: the name they confirm, their agreement to sign electronically, and their signature. */
export const SignDocumentInput = z.object({
  name: personName,
  agreed: z.literal(true, { error: "Agree to sign electronically, or decline" }),
  mark: SignatureMarkInput,
});
export type SignDocumentInput = z.input<typeof SignDocumentInput>;

export const DeclineSigningInput = z.object({
  reason: safeString().trim().min(1, "Say why you decline").max(1000, "At most 1000 characters"),
});

/** One person signing on the installer's phone: their name, their agreement and their signature. */
const InPersonSignerInput = z.object({
  name: personName,
  agreed: z.literal(true, { error: "Each signer agrees to sign electronically" }),
  consentedAt: z.iso.datetime().optional(),
  mark: SignatureMarkInput,
});

/** The installer and the customer sign the certificate of completion together on the installer's phone. */
export const SignCertificateInPersonInput = z.object({
  installer: InPersonSignerInput,
  customer: InPersonSignerInput.extend({
    email: safeString()
      .trim()
      .toLowerCase()
      .max(254)
      .refine((v) => v === "" || z.email().safeParse(v).success, "Enter an e-mail address, or leave it empty")
      .default(""),
  }),
});
export type SignCertificateInPersonInput = z.input<typeof SignCertificateInPersonInput>;
