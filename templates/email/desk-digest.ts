import { escapeHtml, renderEmail } from "./layout";

/** A section of the desk: its first rows, and how many it has in all (the rest are on the desk page at `moreUrl`). */
export type DigestSection = { title: string; total: number; rows: { text: string; url: string }[]; moreUrl: string };

const more = (s: DigestSection) => s.total - s.rows.length;
const moreText = (s: DigestSection) => `and ${more(s)} more on your desk`;

/**
 * The morning digest: what a coordinator has to chase today, section by section, each row linking
 * to its filing. Only sent when at least one section has a row.
 */
export function deskDigestEmail({ dayText, sections, deskUrl }: { dayText: string; sections: DigestSection[]; deskUrl: string }) {
  const listed = sections.filter((s) => s.total > 0);
  const count = listed.reduce((n, s) => n + s.total, 0);
  const subject = `Today's desk, ${dayText}: ${count} ${count === 1 ? "item" : "items"}`;
  const base = renderEmail({
    paragraphs: [`Good morning. What is owed on your projects on ${dayText}:`],
    action: { label: "Open today's desk", url: deskUrl },
  });
  const text = [
    `Good morning. What is owed on your projects on ${dayText}:`,
    ...listed.map((s) =>
      [
        `${s.title} (${s.total})`,
        ...s.rows.map((r) => `- ${r.text}\n  ${r.url}`),
        ...(more(s) > 0 ? [`- ${moreText(s)}: ${s.moreUrl}`] : []),
      ].join("\n"),
    ),
    `Open today's desk: ${deskUrl}`,
    "You can turn this e-mail off in your profile.",
  ].join("\n\n");
  const lists = listed
    .map(
      (s) =>
        `<h3 style="font-size:15px;margin:18px 0 6px">${escapeHtml(s.title)} (${s.total})</h3><ul style="padding-left:18px;margin:0">${s.rows
          .map((r) => `<li style="margin:4px 0"><a href="${escapeHtml(r.url)}" style="color:#8f4c1c">${escapeHtml(r.text)}</a></li>`)
          .join(
            "",
          )}${more(s) > 0 ? `<li style="margin:4px 0"><a href="${escapeHtml(s.moreUrl)}" style="color:#8f4c1c">${escapeHtml(moreText(s))}</a></li>` : ""}</ul>`,
    )
    .join("\n");
  const footer = `<p style="font-size:12px;color:#675f53">You can turn this e-mail off in your profile.</p>`;
  // The lists go after the greeting, before the button.
  const html = base.html.replace("</p>\n<p><a", `</p>\n${lists}\n${footer}\n<p><a`);
  return { subject, text, html };
}
