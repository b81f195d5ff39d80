import { escapeHtml } from "../shared/http";
import { formatAmount } from "./money";
import type { StoredSession } from "./types";

export interface PageState {
  error?: { message: string; field?: string };
  values?: { number?: string; expiry?: string; email?: string };
  notice?: string;
}

const STYLE = `
  :root { color-scheme: light; font-family: system-ui, -apple-system, "Segoe UI", sans-serif; }
  body { margin: 0; background: #f4f4f5; color: #18181b; }
  .banner { background: #fef3c7; border-bottom: 2px solid #d97706; padding: .75rem 1rem; text-align: center; font-weight: 600; }
  main { max-width: 30rem; margin: 2rem auto; background: #fff; border: 1px solid #d4d4d8; border-radius: .5rem; padding: 1.5rem; }
  h1 { font-size: 1.25rem; margin: 0 0 1rem; }
  table { width: 100%; border-collapse: collapse; margin-bottom: 1.25rem; }
  th, td { text-align: left; padding: .4rem 0; border-bottom: 1px solid #e4e4e7; }
  td.num, th.num { text-align: right; }
  tfoot td { font-weight: 700; border-bottom: 0; }
  label { display: block; font-weight: 600; margin: .75rem 0 .25rem; }
  input { width: 100%; box-sizing: border-box; font: inherit; padding: .5rem; border: 1px solid #71717a; border-radius: .25rem; }
  input[aria-invalid="true"] { border-color: #b91c1c; }
  input:focus-visible, button:focus-visible, a:focus-visible { outline: 3px solid #2563eb; outline-offset: 2px; }
  .row { display: flex; gap: 1rem; } .row > div { flex: 1; }
  .hint { color: #52525b; font-size: .875rem; margin: .25rem 0 0; }
  .error { background: #fee2e2; color: #7f1d1d; border: 1px solid #b91c1c; border-radius: .25rem; padding: .75rem; margin-bottom: 1rem; }
  .notice { background: #dcfce7; color: #14532d; border: 1px solid #15803d; border-radius: .25rem; padding: .75rem; }
  button { margin-top: 1.25rem; width: 100%; font: inherit; font-weight: 700; padding: .75rem; border: 0; border-radius: .25rem; background: #1d4ed8; color: #fff; cursor: pointer; }
  .cancel { display: block; text-align: center; margin-top: 1rem; color: #1d4ed8; }
  details { margin-top: 1.5rem; color: #3f3f46; font-size: .875rem; }
`;

function layout(title: string, body: string): string {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="robots" content="noindex">
<title>${escapeHtml(title)}</title>
<style>${STYLE}</style>
</head>
<body>
<div class="banner" role="note">Local test payment page: a development fake, not Stripe. No real card is charged.</div>
<main>
${body}
</main>
</body>
</html>`;
}

function summary(stored: StoredSession): string {
  const { session, lineItems } = stored;
  const rows = lineItems
    .map(
      (li) =>
        `<tr><td>${escapeHtml(li.description)}</td><td class="num">${li.quantity}</td><td class="num">${escapeHtml(
          formatAmount(li.amount_total, li.currency),
        )}</td></tr>`,
    )
    .join("\n");
  return `<table>
<caption class="hint" style="text-align:left">Order summary</caption>
<thead><tr><th scope="col">Item</th><th scope="col" class="num">Qty</th><th scope="col" class="num">Amount</th></tr></thead>
<tbody>
${rows}
</tbody>
<tfoot><tr><td colspan="2">Total due</td><td class="num" data-testid="amount-total">${escapeHtml(
    formatAmount(session.amount_total, session.currency),
  )}</td></tr></tfoot>
</table>`;
}

export function renderCheckoutPage(stored: StoredSession, state: PageState = {}): string {
  const { session } = stored;
  const total = formatAmount(session.amount_total, session.currency);
  if (session.status !== "open") {
    const done = session.status === "complete";
    const next = done
      ? session.success_url.replaceAll("{CHECKOUT_SESSION_ID}", session.id)
      : session.cancel_url;
    return layout(
      done ? "Payment complete" : "Payment page expired",
      `<h1>${done ? "This payment is complete" : "This payment page has expired"}</h1>
${summary(stored)}
<p class="notice" role="status">${done ? `${escapeHtml(total)} was paid.` : "It can no longer be paid. Start a new checkout from the shop."}</p>
${next ? `<a class="cancel" href="${escapeHtml(next)}">Return to the shop</a>` : ""}`,
    );
  }

  const err = state.error;
  const invalid = (field: string) =>
    err?.field === field ? ` aria-invalid="true" aria-describedby="payment-error"` : "";
  const values = state.values ?? {};
  const emailField = session.customer_email
    ? `<p class="hint">Paying as <strong>${escapeHtml(session.customer_email)}</strong></p>`
    : `<label for="email">Email</label>
<input id="email" name="email" type="email" autocomplete="email" value="${escapeHtml(values.email ?? "")}">`;

  return layout(
    `Pay ${total}`,
    `<h1>Pay ${escapeHtml(total)}</h1>
${summary(stored)}
${err ? `<div class="error" id="payment-error" role="alert">${escapeHtml(err.message)}</div>` : ""}
<form method="post" action="/pay/${encodeURIComponent(session.id)}" novalidate>
<fieldset style="border:0;padding:0;margin:0">
<legend style="font-weight:700">Card details</legend>
${emailField}
<label for="card-number">Card number</label>
<input id="card-number" name="cardNumber" inputmode="numeric" autocomplete="cc-number" required placeholder="4242 4242 4242 4242" aria-describedby="card-hint" value="${escapeHtml(
      values.number ?? "",
    )}"${invalid("number")}>
<p class="hint" id="card-hint">Test cards: 4242 4242 4242 4242 succeeds, 4000 0000 0000 0002 is declined.</p>
<div class="row">
<div>
<label for="card-expiry">Expiry (MM/YY)</label>
<input id="card-expiry" name="expiry" inputmode="numeric" autocomplete="cc-exp" required placeholder="12/34" value="${escapeHtml(
      values.expiry ?? "",
    )}"${invalid("expiry")}>
</div>
<div>
<label for="card-cvc">CVC</label>
<input id="card-cvc" name="cvc" inputmode="numeric" autocomplete="cc-csc" required placeholder="123"${invalid("cvc")}>
</div>
</div>
</fieldset>
<button type="submit">Pay ${escapeHtml(total)}</button>
</form>
${session.cancel_url ? `<a class="cancel" href="${escapeHtml(session.cancel_url)}">Cancel and return to the shop</a>` : ""}
<details><summary>About this page</summary>
<p>This page is served by the project's local Stripe fake (<code>fakes/stripe</code>). Session <code>${escapeHtml(session.id)}</code>.</p>
</details>`,
  );
}

export function renderNotFound(id: string): string {
  return layout(
    "Checkout not found",
    `<h1>Checkout session not found</h1><p>No session <code>${escapeHtml(id)}</code> exists on this fake.</p>`,
  );
}
