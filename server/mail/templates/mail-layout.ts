import { MailContent } from '../mail-message';

/** The parts every message is built from; both the text and the HTML part are made from the same words. */
export interface MailParts {
  subject: string;
  greeting: string;
  paragraphs: string[];
  /** A labelled list of figures, e.g. amount and period on a receipt. */
  facts?: [label: string, value: string][];
  action?: { label: string; url: string };
  closing?: string;
}

const SIGNATURE = 'The Commonwort app of your co-op';

export function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

function text(parts: MailParts): string {
  const lines = [parts.greeting, '', ...parts.paragraphs.flatMap((p) => [p, ''])];
  if (parts.facts?.length) lines.push(...parts.facts.map(([label, value]) => `${label}: ${value}`), '');
  if (parts.action) lines.push(`${parts.action.label}:`, parts.action.url, '');
  if (parts.closing) lines.push(parts.closing, '');
  lines.push('-- ', SIGNATURE);
  return lines.join('\n');
}

function html(parts: MailParts): string {
  const e = escapeHtml;
  const facts = parts.facts?.length
    ? `<table role="presentation" style="border-collapse:collapse;margin:0 0 16px">${parts.facts
        .map(([label, value]) => `<tr><td style="padding:2px 16px 2px 0;color:#555">${e(label)}</td><td style="padding:2px 0"><strong>${e(value)}</strong></td></tr>`)
        .join('')}</table>`
    : '';
  const action = parts.action
    ? `<p style="margin:0 0 16px"><a href="${e(parts.action.url)}" style="display:inline-block;padding:10px 18px;background:#2f5d3a;color:#fff;text-decoration:none;border-radius:6px">${e(parts.action.label)}</a></p><p style="margin:0 0 16px;font-size:13px;color:#555">Or open this address: ${e(parts.action.url)}</p>`
    : '';
  return [
    '<!doctype html><html lang="en"><head><meta charset="utf-8"><title>' + e(parts.subject) + '</title></head>',
    '<body style="margin:0;padding:24px;font-family:Arial,Helvetica,sans-serif;font-size:15px;line-height:1.5;color:#1d1d1d;background:#fff">',
    '<div style="max-width:560px">',
    `<p style="margin:0 0 16px">${e(parts.greeting)}</p>`,
    ...parts.paragraphs.map((p) => `<p style="margin:0 0 16px">${e(p)}</p>`),
    facts,
    action,
    parts.closing ? `<p style="margin:0 0 16px">${e(parts.closing)}</p>` : '',
    `<p style="margin:24px 0 0;font-size:13px;color:#555">${e(SIGNATURE)}</p>`,
    '</div></body></html>',
  ].join('');
}

/** Subject, text part and HTML part of one message. */
export function renderMail(parts: MailParts): MailContent {
  return { subject: parts.subject, text: text(parts), html: html(parts) };
}
