import type { OutgoingMail } from './mail.service';

/**
 * How every Fitwright e-mail is laid out: plain text first (what most clients preview), a small HTML twin
 * with the same words and link, signed "— Fitwright".
 */
export function composeMail(
  to: string,
  subject: string,
  paragraphs: string[],
  link?: { label: string; url: string },
  headers?: Record<string, string>,
): OutgoingMail {
  const text = [...paragraphs, ...(link ? [`${link.label}: ${link.url}`] : []), '— Fitwright'].join('\n\n');
  const escape = (value: string) => value.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
  const html = [
    ...paragraphs.map((paragraph) => `<p>${escape(paragraph)}</p>`),
    ...(link ? [`<p><a href="${escape(link.url)}">${escape(link.label)}</a></p>`] : []),
    '<p>— Fitwright</p>',
  ].join('\n');
  return { to, subject, text, html, ...(headers ? { headers } : {}) };
}
