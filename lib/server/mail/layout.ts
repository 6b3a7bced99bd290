/** Shared frame of every message: a plain-text part and an HTML part saying the same thing. */
export interface Message {
  subject: string;
  text: string;
  html: string;
}

export const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c] as string);

interface Body {
  subject: string;
  greeting: string;
  paragraphs: string[];
  action: { label: string; url: string };
  footnote: string;
}

/** Builds both parts from the same sentences so they never drift apart. */
export function compose(b: Body): Message {
  const text = [b.greeting, "", ...b.paragraphs.flatMap((p) => [p, ""]), `${b.action.label}:`, b.action.url, "", b.footnote, "", "-- Benchwright, shop plans for the garage"].join("\n");
  const para = (p: string) => `<p style="margin:0 0 14px">${escapeHtml(p)}</p>`;
  const html = `<!doctype html><html><body style="font-family:system-ui,sans-serif;color:#1f2421;background:#f6f3ee;padding:24px">
<div style="max-width:520px;margin:auto;background:#fff;border-radius:8px;padding:24px">
<p style="margin:0 0 14px">${escapeHtml(b.greeting)}</p>
${b.paragraphs.map(para).join("\n")}
<p style="margin:20px 0"><a href="${escapeHtml(b.action.url)}" style="background:#2f5d50;color:#fff;padding:10px 16px;border-radius:6px;text-decoration:none">${escapeHtml(b.action.label)}</a></p>
<p style="margin:0 0 14px;font-size:13px;color:#555">If the button does not work, paste this address into your browser:<br>${escapeHtml(b.action.url)}</p>
<p style="margin:0;font-size:13px;color:#555">${escapeHtml(b.footnote)}</p>
</div><p style="text-align:center;font-size:12px;color:#777">Benchwright, shop plans for the garage</p></body></html>`;
  return { subject: b.subject, text, html };
}
