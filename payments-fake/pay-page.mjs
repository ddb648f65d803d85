// HTML for the fake's own payment page. Deliberately plain: one column, real
// labels, errors announced to screen readers, and a line that says plainly this
// is a local test page so nobody types a real card into it.
import { TEST_CARDS, formatAmount } from "./ledger.mjs";

const escape = (value) =>
  String(value ?? "").replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]);

const spaced = (number) => number.replace(/(\d{4})(?=\d)/g, "$1 ");

const STYLE = `
  body { margin: 0; font: 16px/1.5 system-ui, sans-serif; color: #1d232b; background: #f3f5f2; }
  main { max-width: 34rem; margin: 0 auto; padding: 1.5rem 1rem 3rem; }
  h1 { font-size: 1.4rem; margin: 1rem 0 0.5rem; }
  .test-mode { border: 2px dashed #7a5a00; background: #fff8df; padding: 0.75rem 1rem; }
  .test-mode ul { margin: 0.25rem 0 0; padding-left: 1.25rem; }
  .alert { border-left: 6px solid #a4161a; background: #fde8e8; padding: 0.75rem 1rem; margin: 1rem 0; font-weight: 600; }
  table { width: 100%; border-collapse: collapse; margin: 0.5rem 0 1rem; }
  th, td { text-align: left; padding: 0.35rem 0; border-bottom: 1px solid #c9cfc6; }
  td.amount, th.amount { text-align: right; }
  form { display: grid; gap: 0.35rem; background: #fff; border: 1px solid #c9cfc6; padding: 1rem; }
  label { font-weight: 600; margin-top: 0.5rem; }
  input { font: inherit; padding: 0.5rem; border: 1px solid #5d6670; }
  input[aria-invalid="true"] { border: 2px solid #a4161a; }
  .pair { display: grid; grid-template-columns: 1fr 1fr; gap: 0 1rem; }
  .pair > div { display: grid; gap: 0.35rem; }
  .hint { color: #4a525b; font-size: 0.9rem; margin: 0; }
  button { font: inherit; font-weight: 700; padding: 0.65rem 1rem; margin-top: 0.75rem; border: 0; background: #1f5130; color: #fff; cursor: pointer; }
  button.secondary { background: #fff; color: #1d232b; border: 2px solid #1d232b; }
  button:focus-visible, a:focus-visible, input:focus-visible { outline: 3px solid #e0a100; outline-offset: 2px; }
  .actions { display: flex; gap: 0.75rem; flex-wrap: wrap; }
  a { color: #1f4f8a; }
`;

function layout(title, body) {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="robots" content="noindex">
<title>${escape(title)}</title>
<style>${STYLE}</style>
</head>
<body>
<main>
${body}
</main>
</body>
</html>`;
}

function testModeNotice() {
  return `<section class="test-mode" aria-label="Test mode">
  <p><strong>Local test-mode payment page.</strong> It runs on this computer only and no card is ever charged. Use one of these test cards, with any future expiry date and any 3-digit CVC:</p>
  <ul>
    <li><code>${spaced(TEST_CARDS.succeeds)}</code> — payment succeeds</li>
    <li><code>${spaced(TEST_CARDS.declined)}</code> — card is declined</li>
    <li><code>${spaced(TEST_CARDS.authentication)}</code> — asks for extra authentication first</li>
  </ul>
</section>`;
}

function alert(message) {
  return message ? `<div class="alert" role="alert" id="payment-error">${escape(message)}</div>` : "";
}

function summary(session, lineItems) {
  const rows = lineItems
    .map(
      (item) =>
        `<tr><td>${escape(item.description)}${item.quantity > 1 ? ` × ${item.quantity}` : ""}</td><td class="amount">${escape(formatAmount(item.amount_total, item.currency))}</td></tr>`,
    )
    .join("\n");
  return `<table>
  <caption class="hint">What you are paying for</caption>
  <thead><tr><th scope="col">Item</th><th scope="col" class="amount">Amount</th></tr></thead>
  <tbody>
${rows}
  </tbody>
  <tfoot><tr><th scope="row">Total</th><td class="amount"><strong>${escape(formatAmount(session.amount_total, session.currency))}</strong></td></tr></tfoot>
</table>`;
}

function cancelLink(session) {
  return session.cancel_url ? `<p><a href="${escape(session.cancel_url)}">Cancel and go back</a></p>` : "";
}

/**
 * The card form.
 * @param {{ session: object, lineItems: object[], error?: string | null, field?: "card_number" | "expiry" | "cvc" | null,
 *   values?: { card_number?: string, expiry?: string, cvc?: string } }} input
 */
export function payPage({ session, lineItems, error = null, field = null, values = {} }) {
  const amount = formatAmount(session.amount_total, session.currency);
  const invalid = (name) => (error && (field === name || (name === "card_number" && !field)) ? ' aria-invalid="true"' : "");
  const described = (name, hint) => {
    const ids = [hint, error && (field === name || (name === "card_number" && !field)) ? "payment-error" : null].filter(Boolean);
    return ids.length ? ` aria-describedby="${ids.join(" ")}"` : "";
  };
  // Screen-reader users hear the title first, so a failed attempt says so there too.
  return layout(
    `${error ? "Error: " : ""}Pay ${amount} — local test payment`,
    `
${testModeNotice()}
<h1>Pay ${escape(amount)}</h1>
${alert(error)}
${summary(session, lineItems)}
<form method="post" action="/pay/${escape(session.id)}">
  <label for="card_number">Card number</label>
  <input id="card_number" name="card_number" inputmode="numeric" autocomplete="cc-number" required
    value="${escape(values.card_number)}"${invalid("card_number")}${described("card_number", "card_number_hint")}>
  <p class="hint" id="card_number_hint">Spaces are optional.</p>
  <div class="pair">
    <div>
      <label for="expiry">Expiry date</label>
      <input id="expiry" name="expiry" autocomplete="cc-exp" placeholder="MM/YY" required
        value="${escape(values.expiry)}"${invalid("expiry")}${described("expiry", "expiry_hint")}>
      <p class="hint" id="expiry_hint">Month and year, as MM/YY.</p>
    </div>
    <div>
      <label for="cvc">CVC</label>
      <input id="cvc" name="cvc" inputmode="numeric" autocomplete="cc-csc" required maxlength="4"
        value="${escape(values.cvc)}"${invalid("cvc")}${described("cvc", "cvc_hint")}>
      <p class="hint" id="cvc_hint">3 or 4 digits.</p>
    </div>
  </div>
  <button type="submit">Pay ${escape(amount)}</button>
</form>
${cancelLink(session)}`,
  );
}

/** The extra step some cards ask for before the payment goes through. */
export function authenticatePage({ session, last4 }) {
  const amount = formatAmount(session.amount_total, session.currency);
  return layout(
    "Confirm this payment — local test payment",
    `
${testModeNotice()}
<h1>Extra authentication needed</h1>
<p>The bank of the card ending in ${escape(last4)} asks you to confirm this payment of <strong>${escape(amount)}</strong>.
This is a simulation: choose what the card holder does.</p>
<form method="post" action="/pay/${escape(session.id)}/authenticate">
  <div class="actions">
    <button type="submit" name="result" value="complete">Complete authentication</button>
    <button type="submit" name="result" value="fail" class="secondary">Fail authentication</button>
  </div>
</form>
${cancelLink(session)}`,
  );
}

/** Shown when the session can no longer take a payment. */
export function closedPage({ session }) {
  if (session.status === "complete") {
    const back = session.success_url.replaceAll("{CHECKOUT_SESSION_ID}", session.id);
    return layout(
      "Already paid — local test payment",
      `
${testModeNotice()}
<h1>This payment is already complete</h1>
<p>${escape(formatAmount(session.amount_total, session.currency))} was paid. Nothing more is needed.</p>
<p><a href="${escape(back)}">Continue</a></p>`,
    );
  }
  return layout(
    "Payment page expired — local test payment",
    `
${testModeNotice()}
<h1>This payment page has expired</h1>
<p>No payment was taken. Start the payment again from the application to get a new page.</p>
${cancelLink(session)}`,
  );
}

export function notFoundPage() {
  return layout(
    "Payment page not found — local test payment",
    `
${testModeNotice()}
<h1>Payment page not found</h1>
<p>There is no payment with this address. Start the payment again from the application.</p>`,
  );
}
