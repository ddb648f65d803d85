/** What holds a commissioning record open, in words: "2 failing, 1 not recorded yet and 1 waiting"; empty when nothing does. */
export function openCountsInWords({ failing, notRecorded, waiting }: { failing: number; notRecorded: number; waiting: number }): string {
  const parts = [
    failing ? `${failing} failing` : null,
    notRecorded ? `${notRecorded} not recorded yet` : null,
    waiting ? `${waiting} waiting` : null,
  ].filter((p): p is string => p !== null);
  return parts.length > 1 ? `${parts.slice(0, -1).join(", ")} and ${parts[parts.length - 1]}` : (parts[0] ?? "");
}
