import type { OutgoingMail } from '../mail/mailer';

const esc = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

export function rfqMail(p: { to: string; from: string; title: string; supplier: string; replyBy: string; quantities: number[]; parts: number; link: string; message: string; reminder?: boolean }): OutgoingMail {
  const qty = p.quantities.map((q) => q.toLocaleString('en')).join(' / ');
  const lines = [
    `${p.from} asks ${p.supplier} for a quotation: ${p.title}.`,
    `${p.parts} part(s) at ${qty} pieces. Please answer by ${p.replyBy}.`,
    ...(p.message ? [p.message] : []),
    'Open the private link below to enter price breaks, MOQ, order multiple, lead time and validity, or to download a sheet, fill it and upload it. No account is needed; the link is for your company only.',
  ];
  const subject = `${p.reminder ? 'Reminder: ' : ''}Request for quotation: ${p.title}`;
  return {
    to: p.to,
    subject,
    text: `${lines.join('\n')}\n\nAnswer here: ${p.link}\n`,
    html: `<!doctype html><body style="font-family:Arial,sans-serif;color:#1E2430;background:#F7F4EE;padding:24px"><div style="max-width:560px;margin:auto;background:#fff;border:1px solid #E3DED4;border-radius:8px;padding:24px"><p style="color:#B5652B;font-weight:700">Farthing</p>${lines.map((l) => `<p>${esc(l)}</p>`).join('')}<p><a href="${esc(p.link)}" style="background:#B5652B;color:#fff;padding:8px 14px;border-radius:6px;text-decoration:none">Answer the request</a></p><p style="color:#5B6270;font-size:12px">${esc(p.link)}</p></div></body>`,
  };
}

export function answeredMail(p: { to: string; supplier: string; title: string; quotes: number; declined: number; link: string }): OutgoingMail {
  return {
    to: p.to,
    subject: `${p.supplier} answered: ${p.title}`,
    text: `${p.supplier} answered your request for quotation "${p.title}": ${p.quotes} offer(s), ${p.declined} part(s) declined.\nThe offers are on the quote board now.\n\n${p.link}\n`,
  };
}
