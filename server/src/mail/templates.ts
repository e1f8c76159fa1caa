import type { OutgoingMail } from './transport';
import { translate } from '../i18n';
import { DEFAULT_LANGUAGE, type Language } from '../../../shared/i18n/languages';

const escape = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

interface Block {
  paragraphs: string[];
  action?: { label: string; url: string };
  /** An inline image sent as an attachment with this content id (a booking's QR code). */
  image?: { cid: string; alt: string };
  footnote?: string;
  /** The reader's language for the mail's own lines (the button's fallback address, the signature); English if none. */
  language?: Language;
}

/** Every Mendery mail: plain paragraphs, at most one button, the same text part. */
export function composeMail(to: string, subject: string, block: Block): OutgoingMail {
  const lang = block.language ?? DEFAULT_LANGUAGE;
  const html = `<!doctype html><html lang="${lang}"><body style="margin:0;background:#f6f1ea;font-family:Nunito,Segoe UI,Arial,sans-serif;color:#1d2a3a">
<table role="presentation" width="100%" cellpadding="0" cellspacing="0"><tr><td align="center" style="padding:24px">
<table role="presentation" width="560" cellpadding="0" cellspacing="0" style="background:#ffffff;border-radius:12px;padding:28px">
<tr><td style="font-size:22px;font-weight:800;color:#23395d;padding-bottom:12px">Mendery</td></tr>
${block.paragraphs.map((p) => `<tr><td style="font-size:16px;line-height:1.5;padding:6px 0">${escape(p)}</td></tr>`).join('\n')}
${block.image ? `<tr><td style="padding:12px 0"><img src="cid:${escape(block.image.cid)}" alt="${escape(block.image.alt)}" width="180" height="180" style="display:block"></td></tr>` : ''}
${
  block.action
    ? `<tr><td style="padding:18px 0"><a href="${escape(block.action.url)}" style="background:#b8612f;color:#ffffff;text-decoration:none;font-weight:700;padding:12px 20px;border-radius:8px;display:inline-block">${escape(block.action.label)}</a></td></tr>
<tr><td style="font-size:13px;color:#56606d">${escape(translate(lang, 'mail.buttonFallback', { url: block.action.url }))}</td></tr>`
    : ''
}
${block.footnote ? `<tr><td style="font-size:13px;color:#56606d;padding-top:16px">${escape(block.footnote)}</td></tr>` : ''}
</table></td></tr></table></body></html>`;
  const text = [
    ...block.paragraphs,
    ...(block.action ? [`${block.action.label}: ${block.action.url}`] : []),
    ...(block.footnote ? [block.footnote] : []),
    translate(lang, 'mail.signature'),
  ].join('\n\n');
  return { to, subject, html, text };
}
