import Link from "next/link";

export default function NotFound() {
  return (
    <main className="mx-auto max-w-lg px-6 py-24 text-center">
      <p className="measure text-sm text-ink-faint">404</p>
      <h1 className="mt-2">Nothing here</h1>
      <p className="mt-3 text-ink-soft">This page does not exist, or it is not yours to see.</p>
      <p className="mt-6">
        <Link href="/dashboard">Back to the projects</Link>
      </p>
    </main>
  );
}
