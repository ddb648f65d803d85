// Type sizes (points) and spacing shared by every part of the diagram, so
// the pieces line up and the overlap test and the layout agree.
export const SIZE = { heading: 11, subheading: 7.5, title: 7.5, label: 7, spec: 6.5, note: 7 } as const;
export const LINE_GAP = 9.5;

/** Splits text into lines of at most `maxChars`, at spaces. */
export function wrapWords(text: string, maxChars: number): string[] {
  const lines: string[] = [];
  let line = "";
  for (const word of text.split(/\s+/).filter(Boolean)) {
    if (line && line.length + 1 + word.length > maxChars) {
      lines.push(line);
      line = word;
    } else {
      line = line ? `${line} ${word}` : word;
    }
  }
  if (line) lines.push(line);
  return lines;
}

/** kW with at most two decimals and no trailing zeros: 7.6, 8.91. */
export function formatKw(watts: number): string {
  return String(Math.round(watts / 10) / 100);
}
