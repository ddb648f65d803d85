/** The next free id of a list line ("inv-3", "S4"), so references stay stable when lines are removed. */
export function nextLineId(prefix: string, taken: string[]): string {
  const numbers = taken.map((id) => Number(id.replace(/^\D+-?/, ""))).filter(Number.isFinite);
  const next = (numbers.length ? Math.max(...numbers) : 0) + 1;
  return prefix === "S" ? `S${next}` : `${prefix}-${next}`;
}
