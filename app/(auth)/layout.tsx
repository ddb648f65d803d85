import { Wordmark } from "@/components/brand/wordmark";

export default function AuthLayout({ children }: { children: React.ReactNode }) {
  return (
    <main className="flex min-h-screen items-center justify-center px-4 py-12">
      <div className="w-full max-w-sm">
        <div className="mb-8 text-center">
          <Wordmark />
          <p className="mt-2 text-sm text-ink-faint">Solar permit and interconnection paperwork, from one design.</p>
        </div>
        <div className="panel p-6">{children}</div>
      </div>
    </main>
  );
}
