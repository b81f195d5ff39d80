import { escapeHtml } from "../shared/http";
import type { StoredMessage } from "./store";

const STYLE = `
  body { font-family: system-ui, sans-serif; margin: 0; color: #18181b; background: #fafafa; }
  .banner { background: #fef3c7; border-bottom: 2px solid #d97706; padding: .6rem 1rem; font-weight: 600; }
  main { padding: 1rem; max-width: 64rem; margin: 0 auto; }
  table { width: 100%; border-collapse: collapse; background: #fff; }
  th, td { text-align: left; padding: .4rem .6rem; border-bottom: 1px solid #e4e4e7; vertical-align: top; }
  iframe { width: 100%; height: 32rem; border: 1px solid #d4d4d8; background: #fff; }
  pre { white-space: pre-wrap; background: #fff; border: 1px solid #d4d4d8; padding: .75rem; }
  a:focus-visible, button:focus-visible { outline: 3px solid #2563eb; outline-offset: 2px; }
`;

function layout(title: string, body: string): string {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(title)}</title><style>${STYLE}</style></head><body>
<div class="banner" role="note">Local mail catcher: a development fake. Nothing here was really sent.</div>
<main>${body}</main></body></html>`;
}

export function renderInbox(messages: StoredMessage[]): string {
  const rows = messages
    .map(
      (m) =>
        `<tr><td>${escapeHtml(new Date(m.receivedAt).toLocaleString("en-GB"))}</td><td>${m.via}</td><td>${escapeHtml(
          m.to.join(", "),
        )}</td><td><a href="/messages/${m.id}/view">${escapeHtml(m.subject ?? "(no subject)")}</a></td></tr>`,
    )
    .join("\n");
  return layout(
    "Mail catcher",
    `<h1>Caught mail (${messages.length})</h1>
<table><caption style="text-align:left">Newest first</caption>
<thead><tr><th scope="col">Received</th><th scope="col">Via</th><th scope="col">To</th><th scope="col">Subject</th></tr></thead>
<tbody>${rows || `<tr><td colspan="4">No messages yet.</td></tr>`}</tbody></table>`,
  );
}

export function renderMessage(m: StoredMessage): string {
  return layout(
    m.subject ?? "Message",
    `<p><a href="/">← All messages</a></p>
<h1>${escapeHtml(m.subject ?? "(no subject)")}</h1>
<dl>
<dt>From</dt><dd>${escapeHtml(m.headers["from"] ?? m.from ?? "")}</dd>
<dt>To</dt><dd>${escapeHtml(m.to.join(", "))}</dd>
<dt>Via</dt><dd>${m.via}</dd>
</dl>
${m.html !== null ? `<h2>HTML</h2><iframe title="HTML body" sandbox="" srcdoc="${escapeHtml(m.html)}"></iframe>` : ""}
${m.text !== null ? `<h2>Text</h2><pre>${escapeHtml(m.text)}</pre>` : ""}`,
  );
}
