// The fake's hosted checkout page: plain HTML, no script, labelled as a local test page.
// Colours are the portal's design tokens (app/app.css), copied as values.

const escape = (value) =>
  String(value ?? "").replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]);

/** Minor units → "€12.50" / "¥500", using the currency's own number of decimals. */
export function formatMoney(amount, currency) {
  try {
    const format = new Intl.NumberFormat("en-GB", { style: "currency", currency: currency.toUpperCase() });
    const digits = format.resolvedOptions().maximumFractionDigits ?? 2;
    return format.format(amount / 10 ** digits);
  } catch {
    return `${amount} ${currency.toUpperCase()} (minor units)`;
  }
}

const css = `
  :root { color-scheme: light; }
  * { box-sizing: border-box; }
  body { margin: 0; background: #f3f1ea; color: #171b22; font: 16px/1.5 system-ui, -apple-system, "Segoe UI", "Noto Sans", sans-serif; }
  .band { background: #fbf0da; color: #744600; border-bottom: 1px solid #d9d5c9; padding: .6rem 1rem; text-align: center; font-size: .9rem; }
  main { max-width: 34rem; margin: 2.5rem auto; padding: 0 1rem; }
  .sheet { background: #ffffff; border: 1px solid #d9d5c9; border-radius: 6px; padding: 1.5rem; }
  h1 { font-size: 1.35rem; margin: 0 0 .25rem; }
  .quiet { color: #59564c; font-size: .9rem; margin: 0; }
  table { width: 100%; border-collapse: collapse; margin: 1.25rem 0; }
  th, td { text-align: left; padding: .5rem 0; border-bottom: 1px solid #d9d5c9; vertical-align: top; }
  th { font-size: .8rem; text-transform: uppercase; letter-spacing: .04em; color: #59564c; font-weight: 600; }
  .num { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; padding-left: 1rem; }
  tfoot td { border-bottom: none; font-weight: 700; padding-top: .75rem; }
  .actions { display: grid; gap: .6rem; margin-top: 1rem; }
  button { font: inherit; font-weight: 600; padding: .7rem 1rem; border-radius: 4px; cursor: pointer; border: 1px solid #8c877a; background: #ffffff; color: #171b22; }
  button.pay { background: #171b22; color: #ffffff; border-color: #171b22; }
  button.decline { color: #a4161a; border-color: #a4161a; }
  button:focus-visible { outline: 3px solid #b01e64; outline-offset: 2px; }
  .note { margin-top: 1.25rem; font-size: .85rem; color: #59564c; }
  code { overflow-wrap: anywhere; }
  @media (max-width: 30rem) { main { margin-top: 1.25rem; } .sheet { padding: 1rem; } table { font-size: .9rem; } }
  .state { padding: .75rem 1rem; border-radius: 4px; background: #e7efe3; color: #2c5a37; }
  .state.bad { background: #fbe9e7; color: #a4161a; }
  a { color: #b01e64; }
`;

function layout(title, body) {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="robots" content="noindex">
<title>${escape(title)} · local test payment</title>
<style>${css}</style>
</head>
<body>
<div class="band" role="note"><strong>Local test payment page.</strong> This is the development stand-in for the card processor: no real card is asked for and no money moves.</div>
<main>${body}</main>
</body>
</html>`;
}

export function checkoutPage(session, items) {
  const rows = items
    .map(
      (item) => `<tr><td>${escape(item.description)}</td><td class="num">${item.quantity}</td><td class="num">${escape(formatMoney(item.price.unit_amount, item.currency))}</td><td class="num">${escape(formatMoney(item.amount_total, item.currency))}</td></tr>`,
    )
    .join("\n");
  const who = session.customer_email ? `<p class="quiet">Receipt to ${escape(session.customer_email)}</p>` : "";
  return layout(
    "Checkout",
    `<div class="sheet">
<h1>Pay ${escape(formatMoney(session.amount_total, session.currency))}</h1>
${who}
<table>
<thead><tr><th scope="col">Item</th><th scope="col" class="num">Qty</th><th scope="col" class="num">Unit</th><th scope="col" class="num">Amount</th></tr></thead>
<tbody>
${rows}
</tbody>
<tfoot><tr><td colspan="3">Total (no tax computed)</td><td class="num">${escape(formatMoney(session.amount_total, session.currency))}</td></tr></tfoot>
</table>
<form method="post" class="actions">
<button class="pay" type="submit" name="outcome" value="pay">Pay with test card</button>
<button class="decline" type="submit" name="outcome" value="decline">Card declined</button>
<button type="submit" name="outcome" value="cancel">Cancel</button>
</form>
<p class="note">Session <code>${escape(session.id)}</code>. “Pay with test card” completes the payment and notifies the portal; “Card declined” reports a failed card; “Cancel” returns without paying.</p>
</div>`,
  );
}

export function statePage(title, message, link, bad = false) {
  const back = link ? `<p><a href="${escape(link)}">Return to the site</a></p>` : "";
  return layout(title, `<div class="sheet"><h1>${escape(title)}</h1><p class="state${bad ? " bad" : ""}">${escape(message)}</p>${back}</div>`);
}
