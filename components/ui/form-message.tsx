export function FormMessage({ kind, children }: { kind: "error" | "info"; children: React.ReactNode }) {
  if (!children) return null;
  const tone =
    kind === "error" ? "border-result-fail/40 bg-result-fail/5 text-result-fail" : "border-paper-edge bg-paper-deep text-ink-soft";
  return (
    <div data-testid="form-message" role={kind === "error" ? "alert" : "status"} className={`rounded border px-3 py-2 text-sm ${tone}`}>
      {children}
    </div>
  );
}
