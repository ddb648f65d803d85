import type { Metadata, Viewport } from "next";
import localFont from "next/font/local";
import { connection } from "next/server";
import "./globals.css";

const text = localFont({ src: "./fonts/inter-latin-wght-normal.woff2", variable: "--font-text", weight: "100 900", display: "swap" });
const measure = localFont({
  src: [
    { path: "./fonts/ibm-plex-mono-latin-400-normal.woff2", weight: "400" },
    { path: "./fonts/ibm-plex-mono-latin-500-normal.woff2", weight: "500" },
  ],
  variable: "--font-measure",
  display: "swap",
});

export const metadata: Metadata = {
  title: { default: "Ohmstead", template: "%s · Ohmstead" },
  description: "Design checks, permit and interconnection paperwork for grid-tied solar PV projects.",
};

export const viewport: Viewport = { width: "device-width", initialScale: 1, themeColor: "#f7f3ea" };

export default async function RootLayout({ children }: { children: React.ReactNode }) {
  // Every page is rendered per request, so that Next.js can put the request's CSP nonce (proxy.ts) on its scripts.
  await connection();
  return (
    <html lang="en-US" className={`${text.variable} ${measure.variable}`}>
      <body>{children}</body>
    </html>
  );
}
