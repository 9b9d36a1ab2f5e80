/**
 * The hosted pages' shared markup: plain HTML forms that work without JavaScript, in a
 * plain grey-and-white look of the fake's own, marked as a local test page.
 */
export function esc(value: unknown): string {
  return String(value ?? '')
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&#39;');
}

/** `2900, 'usd'` → `29.00 USD` (ISO 4217 code after the amount; every price here has two decimals). */
export function money(minor: number, currency: string): string {
  return `${(minor / 100).toFixed(2)} ${currency.toUpperCase()}`;
}

/** Unix seconds → `2026-12-31` (UTC). */
export function day(unixSeconds: number): string {
  return new Date(unixSeconds * 1000).toISOString().slice(0, 10);
}

const css = `
*{box-sizing:border-box}
body{margin:0;font:16px/1.5 system-ui,-apple-system,"Segoe UI",sans-serif;background:#eceef1;color:#1f2328}
.banner{background:#3a4350;color:#fff;font-size:13px;padding:6px 16px;text-align:center}
main{max-width:440px;margin:32px auto;padding:24px;background:#fff;border:1px solid #d5d9df;border-radius:6px}
h1{font-size:20px;margin:0 0 4px}
h2{font-size:16px;margin:24px 0 8px}
.muted{color:#5c6470;font-size:14px}
label{display:block;font-size:14px;font-weight:600;margin:14px 0 4px}
input[type=text]{width:100%;padding:9px 10px;font:inherit;border:1px solid #aeb4bd;border-radius:4px}
.row{display:flex;gap:12px}.row>div{flex:1}
button{margin-top:18px;width:100%;padding:11px;font:inherit;font-weight:600;color:#fff;background:#2f3742;border:0;border-radius:4px;cursor:pointer}
button:hover{background:#161b22}
button.secondary{background:#fff;color:#2f3742;border:1px solid #2f3742}
.alert{margin:14px 0 0;padding:10px 12px;border-radius:4px;background:#fbeaea;border:1px solid #d9a3a3;color:#7a1f1f}
.notice{margin:14px 0 0;padding:10px 12px;border-radius:4px;background:#e9f2ec;border:1px solid #9cc3a8;color:#1f5130}
.choice{display:flex;align-items:center;gap:8px;font-weight:400;margin:8px 0}
table{width:100%;border-collapse:collapse;font-size:14px}td,th{text-align:left;padding:4px 6px;border-bottom:1px solid #e3e6ea}
a{color:#2f3742}
p.links{margin-top:18px;text-align:center}
`;

export function layout(title: string, body: string): string {
  return `<!doctype html>
<html lang="en">
<head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"><title>${esc(title)}</title><style>${css}</style></head>
<body>
<div class="banner">Local test page of the payment fake: no real payment is taken.</div>
<main>
${body}
</main>
</body>
</html>`;
}

export function messagePage(title: string, message: string, link?: { href: string; text: string }): string {
  return layout(title, `<h1>${esc(title)}</h1><p>${esc(message)}</p>${link ? `<p class="links"><a href="${esc(link.href)}">${esc(link.text)}</a></p>` : ''}`);
}
