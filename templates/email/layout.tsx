import type { ReactNode } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';

/**
 * The frame of every HTML mail: rendered by React, so every value is escaped by React itself.
 * Plain inline styles only (mail readers drop stylesheets).
 */
function EmailFrame({ children }: { children: ReactNode }) {
  return (
    <html lang="en">
      <body style={{ margin: 0, padding: '24px', backgroundColor: '#f6f4ef', color: '#1b1b1b', fontFamily: 'Helvetica, Arial, sans-serif', fontSize: '16px', lineHeight: 1.5 }}>
        <div style={{ maxWidth: '560px', margin: '0 auto', backgroundColor: '#ffffff', border: '2px solid #1b1b1b', padding: '24px' }}>
          <p style={{ margin: '0 0 16px', fontWeight: 700, letterSpacing: '0.2em', textTransform: 'uppercase' }}>Placard</p>
          {children}
        </div>
      </body>
    </html>
  );
}

export const renderEmailHtml = (body: ReactNode) => `<!doctype html>${renderToStaticMarkup(<EmailFrame>{body}</EmailFrame>)}`;

/** A link drawn as a button, with the address written out below for readers that hide links. */
export function ActionLink({ href, children }: { href: string; children: ReactNode }) {
  return (
    <>
      <p style={{ margin: '24px 0' }}>
        <a href={href} style={{ display: 'inline-block', backgroundColor: '#1b1b1b', color: '#ffffff', padding: '12px 20px', textDecoration: 'none', fontWeight: 700 }}>
          {children}
        </a>
      </p>
      <p style={{ fontSize: '13px', color: '#555555', wordBreak: 'break-all' }}>{href}</p>
    </>
  );
}
