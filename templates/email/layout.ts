export const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);

/** Wraps paragraphs and one call-to-action link into the plain, printable HTML every Ohmstead e-mail uses. */
export function renderEmail({ paragraphs, action }: { paragraphs: string[]; action?: { label: string; url: string } }) {
  const html = `<!doctype html><html><body style="background:#f7f3ea;color:#1f1c17;font-family:Helvetica,Arial,sans-serif;padding:24px">
<div style="max-width:560px;margin:auto;background:#fffdf8;border:1px solid #ddd3bf;padding:24px">
<p style="font-weight:700;color:#8f4c1c;letter-spacing:.04em">OHMSTEAD</p>
${paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`).join("\n")}
${action ? `<p><a href="${escapeHtml(action.url)}" style="display:inline-block;background:#a35a24;color:#fff;padding:10px 16px;text-decoration:none">${escapeHtml(action.label)}</a></p><p style="font-size:12px;color:#675f53">${escapeHtml(action.url)}</p>` : ""}
</div></body></html>`;
  const text = [...paragraphs, ...(action ? [`${action.label}: ${action.url}`] : [])].join("\n\n");
  return { html, text };
}
