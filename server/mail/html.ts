/** Escapes text for an HTML e-mail part. */
export const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);

/**
 * A plain HTML e-mail body: paragraphs, one button-like link, and a small print line. Inline
 * styles only, since mail programs drop style sheets.
 */
export function simpleHtmlMail(parts: { paragraphs: string[]; link: { href: string; label: string }; smallPrint: string[] }): string {
  const p = (html: string) => `<p style="margin:0 0 16px;font-size:16px;line-height:1.5;color:#1A1F29">${html}</p>`;
  return [
    "<!doctype html>",
    '<html lang="en"><body style="margin:0;padding:24px;background:#F7F5F0;font-family:Arial,Helvetica,sans-serif">',
    '<div style="max-width:560px;margin:0 auto;background:#FFFFFF;border:1px solid #D8D3C8;border-radius:12px;padding:24px">',
    ...parts.paragraphs.map(p),
    `<p style="margin:24px 0"><a href="${escapeHtml(parts.link.href)}" style="display:inline-block;padding:12px 20px;background:#0B5C8E;color:#FFFFFF;font-weight:bold;text-decoration:none;border-radius:8px">${escapeHtml(parts.link.label)}</a></p>`,
    ...parts.smallPrint.map((line) => `<p style="margin:0 0 8px;font-size:14px;line-height:1.5;color:#4B5262">${line}</p>`),
    "</div></body></html>",
  ].join("\n");
}
