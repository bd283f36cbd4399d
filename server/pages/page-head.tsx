import { config } from '../config';

/** A picture for link previews, as sized on disk. */
export type SharedImage = { url: string; width: number; height: number };

const absolute = (url: string) => (url.startsWith('http') ? url : `${config.publicBaseUrl}${url}`);

/**
 * The head every server-rendered page shares: a phone's viewport, the title and description, what
 * a shared link shows (with its picture when there is one) and the page's own inline CSS, so the
 * first paint needs no second request on a weak signal.
 */
export function PageHead(props: { title: string; shareTitle?: string; description: string; css: string; url?: string; image?: SharedImage | null; noindex?: boolean }) {
  const { title, description, css, url, image, noindex } = props;
  // A shared link names the thing itself; the browser tab adds the site.
  const shareTitle = props.shareTitle ?? title;
  return (
    <head>
      <meta charSet="utf-8" />
      <meta name="viewport" content="width=device-width, initial-scale=1" />
      <title>{title}</title>
      <meta name="description" content={description} />
      {url ? <link rel="canonical" href={url} /> : null}
      <meta property="og:type" content="website" />
      <meta property="og:site_name" content="Placard" />
      <meta property="og:title" content={shareTitle} />
      <meta property="og:description" content={description} />
      {url ? <meta property="og:url" content={url} /> : null}
      {image ? <meta property="og:image" content={absolute(image.url)} /> : null}
      {image ? <meta property="og:image:width" content={String(image.width)} /> : null}
      {image ? <meta property="og:image:height" content={String(image.height)} /> : null}
      <meta name="twitter:card" content={image ? 'summary_large_image' : 'summary'} />
      <meta name="twitter:title" content={shareTitle} />
      <meta name="twitter:description" content={description} />
      {image ? <meta name="twitter:image" content={absolute(image.url)} /> : null}
      <meta name="theme-color" content="#F5F0E6" />
      {noindex ? <meta name="robots" content="noindex" /> : null}
      <style dangerouslySetInnerHTML={{ __html: css }} />
    </head>
  );
}
