/** Shared pieces of the notice e-mails: HTML escaping and the plain frame every notice uses. */
export const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

export type EmailParts = { subject: string; text: string; html: string };

/**
 * One notice from paragraphs and an optional button link. Every paragraph is plain text,
 * escaped for the HTML part, so a show or build name can never inject markup.
 */
export function notice(params: { subject: string; greeting: string; paragraphs: string[]; link?: { label: string; url: string }; after?: string[] }): EmailParts {
  const { subject, greeting, paragraphs, link, after = [] } = params;
  const text = [greeting, '', ...paragraphs.flatMap((p) => [p, '']), ...(link ? [`${link.label}: ${link.url}`, ''] : []), ...after.flatMap((p) => [p, '']), '— Placard'].join('\n');
  const html = [
    `<p>${escapeHtml(greeting)}</p>`,
    ...paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`),
    link ? `<p><a href="${escapeHtml(link.url)}">${escapeHtml(link.label)}</a></p>` : '',
    ...after.map((p) => `<p>${escapeHtml(p)}</p>`),
    '<p>— Placard</p>',
  ]
    .filter(Boolean)
    .join('\n');
  return { subject, text, html };
}
