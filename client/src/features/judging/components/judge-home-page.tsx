import { Link } from 'react-router-dom';
import { EmptyState, ErrorState, LoadingState } from '@client/components/ui/states';
import { useJudgingShows } from '../api/list-judging-shows';

/** The shows this person is judging now; one tap opens their cars. */
export function JudgeHomePage() {
  return (
    <>
      <h1 className="mb-3 font-display text-3xl uppercase">Shows to judge</h1>
      <ShowsToJudge />
    </>
  );
}

function ShowsToJudge() {
  const { data, error, isPending, refetch } = useJudgingShows();
  if (isPending) return <LoadingState />;
  if (error) return <ErrorState error={error} onRetry={() => void refetch()} />;
  if (!data.events.length) return <EmptyState title="Nothing to judge now">Shows you judge appear here while they are being judged.</EmptyState>;
  return (
    <ul className="space-y-2">
      {data.events.map((e) => (
        <li key={e.id}>
          <Link to={`/judge/${e.id}`} className="flex min-h-16 items-center border-2 border-ink bg-white px-3 font-display text-2xl uppercase">
            {e.name}
          </Link>
        </li>
      ))}
    </ul>
  );
}
