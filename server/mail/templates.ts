import type { OutgoingMail } from './mailer';

const esc = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

function layout(title: string, paragraphs: string[], link: { href: string; label: string }): string {
  return `<!doctype html><html><body style="background:#F7F4EE;color:#1E2430;font-family:'Work Sans',Arial,sans-serif;padding:24px">
<div style="max-width:520px;margin:auto;background:#fff;border:1px solid #E3DED4;border-radius:8px;padding:24px">
<p style="color:#B5652B;font-weight:700;margin:0 0 12px">Farthing</p><h1 style="font-size:18px">${esc(title)}</h1>
${paragraphs.map((p) => `<p>${esc(p)}</p>`).join('')}
<p><a href="${esc(link.href)}" style="background:#B5652B;color:#fff;padding:8px 14px;border-radius:6px;text-decoration:none">${esc(link.label)}</a></p>
<p style="color:#5B6270;font-size:12px">Or open this address: ${esc(link.href)}</p></div></body></html>`;
}

export function inviteMail(p: { to: string; inviter: string; workspace: string; role: string; link: string; expiresAt: Date }): OutgoingMail {
  const lines = [
    `${p.inviter} invited you to the ${p.workspace} workspace on Farthing as ${p.role}.`,
    `The invitation link works once and expires on ${p.expiresAt.toISOString().slice(0, 16).replace('T', ' ')} UTC.`,
  ];
  return {
    to: p.to,
    subject: `Join ${p.workspace} on Farthing`,
    text: `${lines.join('\n')}\n\nAccept the invitation: ${p.link}\n`,
    html: layout(`Join ${p.workspace}`, lines, { href: p.link, label: 'Accept the invitation' }),
  };
}

export function resetMail(p: { to: string; link: string }): OutgoingMail {
  const lines = [
    'Someone (we hope you) asked to reset your Farthing password.',
    'The link works once and expires in one hour. If you did not ask, ignore this mail.',
  ];
  return {
    to: p.to,
    subject: 'Reset your Farthing password',
    text: `${lines.join('\n')}\n\nChoose a new password: ${p.link}\n`,
    html: layout('Reset your password', lines, { href: p.link, label: 'Choose a new password' }),
  };
}
