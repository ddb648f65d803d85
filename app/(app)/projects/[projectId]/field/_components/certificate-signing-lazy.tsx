"use client";

import dynamic from "next/dynamic";

// Signing on the phone comes last on this page: its code and the drawing pad's arrive after the
// readings' form is ready, not with it.
export const CertificateSigning = dynamic(() => import("./certificate-signing").then((m) => m.CertificateSigning));
