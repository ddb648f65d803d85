import type { Metadata } from "next";
import { Wordmark } from "@/components/brand/wordmark";

// Signing pages: no app shell, no session, never indexed; narrow enough to read on a phone.
export const metadata: Metadata = { robots: { index: false, follow: false, nocache: true } };

export default function SignLayout({ children }: { children: React.ReactNode }) {
  return (
    <main className="mx-auto max-w-3xl px-3 py-6 sm:px-4 sm:py-8">
      <div className="mb-4">
        <Wordmark />
      </div>
      {children}
    </main>
  );
}
