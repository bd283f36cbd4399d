import { ActionLink, renderEmailHtml } from './layout';

export type EmailParts = { subject: string; text: string; html: string };

/**
 * One notice from paragraphs and an optional button link, as text and as HTML in the shared frame.
 * Every paragraph is plain text rendered by React, so a show or build name can never inject markup.
 */
export function notice(params: { subject: string; greeting: string; paragraphs: string[]; link?: { label: string; url: string }; after?: string[] }): EmailParts {
  const { subject, greeting, paragraphs, link, after = [] } = params;
  const text = [greeting, '', ...paragraphs.flatMap((p) => [p, '']), ...(link ? [`${link.label}: ${link.url}`, ''] : []), ...after.flatMap((p) => [p, '']), '— Placard'].join('\n');
  const html = renderEmailHtml(
    <>
      <p>{greeting}</p>
      {paragraphs.map((p, i) => (
        <p key={`p${i}`}>{p}</p>
      ))}
      {link ? <ActionLink href={link.url}>{link.label}</ActionLink> : null}
      {after.map((p, i) => (
        <p key={`a${i}`}>{p}</p>
      ))}
      <p>— Placard</p>
    </>,
  );
  return { subject, text, html };
}
