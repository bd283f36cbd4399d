import type { Photo } from '@shared/schemas/build';

/** A stored photo at the size the screen needs: WebP where the browser takes it, JPEG otherwise. */
export function PhotoImage({ photo, sizes, alt, className = '' }: { photo: Photo; sizes: string; alt: string; className?: string }) {
  const sources = [...photo.sources].sort((a, b) => a.width - b.width);
  if (!sources.length) return null;
  const smallest = sources[0]!;
  return (
    <picture>
      <source type="image/webp" srcSet={sources.map((s) => `${s.webp} ${s.width}w`).join(', ')} sizes={sizes} />
      <img
        src={smallest.jpeg}
        srcSet={sources.map((s) => `${s.jpeg} ${s.width}w`).join(', ')}
        sizes={sizes}
        width={smallest.width}
        height={smallest.height}
        alt={alt}
        loading="lazy"
        decoding="async"
        className={className}
      />
    </picture>
  );
}
