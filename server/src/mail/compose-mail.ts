import type { MailMessage } from './mail-message.js';

/** What a notice says, before it becomes the text and HTML parts of a mail. */
export interface MailNotice {
  to: string;
  subject: string;
  /** First line of the mail, e.g. "Review requested". */
  heading: string;
  /** Plain sentences; user-typed text (notes, comments) is escaped in the HTML part. */
  paragraphs: string[];
  /** A path of the app, like "/revisions/123", and the words of its link. */
  path: string;
  linkLabel: string;
}

/** Builds the plain-text and the HTML part of a notice, both carrying the absolute link into the app. */
export function composeMail(notice: MailNotice, appUrl: string): MailMessage {
  const link = new URL(notice.path, `${appUrl}/`).toString();
  const text = [notice.heading, '', ...notice.paragraphs.flatMap((p) => [wrapText(p), '']), `${notice.linkLabel}:`, link, '', '— Channelwright'].join('\n');
  const html = [
    '<!doctype html><html><body style="font-family: sans-serif; line-height: 1.5">',
    `<h2>${escapeHtml(notice.heading)}</h2>`,
    ...notice.paragraphs.map((p) => `<p>${escapeHtml(p).replace(/\n/g, '<br>')}</p>`),
    `<p><a href="${escapeHtml(link)}">${escapeHtml(notice.linkLabel)}</a></p>`,
    '<p style="color: #666">— Channelwright</p>',
    '</body></html>',
  ].join('\n');
  return { to: notice.to, subject: notice.subject, text, html, link };
}

/** Plain-text lines are kept within this width (RFC 5322, 2.1.1: lines SHOULD be no more than 78 characters). */
export const TEXT_WIDTH = 72;

/** Breaks a paragraph at spaces so that no line is longer than `width`, keeping its own line breaks; a word longer than that stays whole. */
export function wrapText(paragraph: string, width = TEXT_WIDTH): string {
  return paragraph
    .split('\n')
    .map((line) => {
      const lines: string[] = [];
      let current = '';
      for (const word of line.split(' ')) {
        if (current !== '' && current.length + 1 + word.length > width) {
          lines.push(current);
          current = word;
        } else {
          current = current === '' ? word : `${current} ${word}`;
        }
      }
      lines.push(current);
      return lines.join('\n');
    })
    .join('\n');
}

const HTML_ESCAPES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };

export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (character) => HTML_ESCAPES[character]!);
}
