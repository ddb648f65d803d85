import type { Metadata } from "next";
import { Wordmark } from "@/components/brand/wordmark";

// Inspector pages: no app shell, no session, never indexed.
export const metadata: Metadata = { robots: { index: false, follow: false, nocache: true } };

export default function ShareLayout({ children }: { children: React.ReactNode }) {
  return (
    <main className="mx-auto max-w-5xl px-4 py-8">
      <div className="mb-6">
        <Wordmark />
      </div>
      {children}
    </main>
  );
}
