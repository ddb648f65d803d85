// The sentence a signer reads and agrees to before signing electronically. Its wording is stored with
// each signature, so a later change of wording never rewrites what an earlier signer agreed to.

export const ELECTRONIC_SIGNATURE_CONSENT =
  "I agree to sign this document electronically. My drawn or typed signature has the same effect as my handwritten signature on paper. " +
  "I can download the signed copy, and I can ask the sender for a paper copy to sign by hand instead.";
