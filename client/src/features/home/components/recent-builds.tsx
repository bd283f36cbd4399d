import { BUILD_STYLE_LABELS } from '@shared/schemas/build';
import { useRecentBuilds } from '../api/list-recent-builds';
import { EmptyState, ErrorState, LoadingState } from '@client/components/ui/states';

/** Published builds, newest first: each opens its public page, as a scanned card would. */
export function RecentBuilds() {
  const { data, isPending, error, refetch } = useRecentBuilds();
  if (isPending) return <LoadingState label="Loading builds…" />;
  if (error) return <ErrorState error={error} onRetry={() => void refetch()} />;
  if (!data.builds.length) return <EmptyState title="No builds published yet">Owners publish a build sheet from My builds.</EmptyState>;
  return (
    <ul className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
      {data.builds.map((b) => {
        const small = b.cover?.sources[0];
        const style = b.style && b.style in BUILD_STYLE_LABELS ? BUILD_STYLE_LABELS[b.style as keyof typeof BUILD_STYLE_LABELS] : null;
        return (
          <li key={b.code} className="border border-rule bg-white/60">
            {/* A plain link: the public page is server HTML, outside the app. */}
            <a href={`/c/${b.code}`} className="block hover:bg-paper">
              {small ? (
                <img
                  src={small.jpeg}
                  srcSet={b.cover!.sources.map((s) => `${s.webp} ${s.width}w`).join(', ')}
                  sizes="(min-width: 1024px) 320px, (min-width: 640px) 50vw, 100vw"
                  width={small.width}
                  height={small.height}
                  loading="lazy"
                  alt=""
                  className="aspect-[8/5] w-full object-cover"
                />
              ) : (
                <div className="flex aspect-[8/5] items-center justify-center bg-rule/40 font-display uppercase text-graphite">No photo yet</div>
              )}
              <div className="px-3 py-2">
                <p className="font-display text-xl uppercase">{b.title}</p>
                <p className="text-sm text-graphite">{[b.modelYear, style].filter(Boolean).join(' · ')}</p>
              </div>
            </a>
          </li>
        );
      })}
    </ul>
  );
}
