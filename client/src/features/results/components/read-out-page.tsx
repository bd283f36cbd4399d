import { Link, useParams } from 'react-router-dom';
import { placeWords } from '@shared/schemas/results';
import { readOutHeading, type ReadOutCall } from '@shared/schemas/read-out';
import { ErrorState, LoadingState } from '@client/components/ui/states';
import { useReadOut } from '../api/get-read-out';

function Call({ call, placed }: { call: ReadOutCall; placed: boolean }) {
  const from = [call.owner?.hometown, call.owner?.club].filter(Boolean).join(' · ');
  return (
    <li className="border-b border-rule py-3">
      {placed ? <p className="font-display text-xl uppercase text-signal-ink">{placeWords(call.place, call.shared)}</p> : null}
      <p className="font-display text-3xl leading-tight">
        <span className="tabular-nums">{call.number}</span> · {call.title}
      </p>
      {call.owner ? (
        <p className="text-2xl leading-snug">
          {call.owner.name}
          {from ? <span className="block text-xl text-graphite">{from}</span> : null}
        </p>
      ) : null}
    </li>
  );
}

/** The announcer's read-out on a phone: large type, each class third to first, then best of show and people's choice. */
export function ReadOutPage() {
  const eventId = Number(useParams().id);
  const readOut = useReadOut(eventId);
  if (readOut.isPending) return <LoadingState />;
  if (readOut.error) return <ErrorState error={readOut.error} />;
  const { showName, sections } = readOut.data.readOut;
  return (
    <article className="mx-auto max-w-2xl">
      <p>
        <Link className="inline-flex min-h-11 items-center underline" to={`/shows/${eventId}`}>
          Back to the show
        </Link>
      </p>
      <h1 className="font-display text-3xl uppercase">Read-out: {showName}</h1>
      <p className="text-lg text-graphite">Each class from third place to first, then best of show and people’s choice.</p>
      {sections.map((section, i) => (
        <section key={i} aria-label={readOutHeading(section)} className="mt-8">
          <h2 className="border-b-4 border-ink font-display text-4xl uppercase">{readOutHeading(section)}</h2>
          <ol>
            {section.calls.map((call) => (
              <Call key={`${call.place}-${call.number}`} call={call} placed={section.kind === 'class'} />
            ))}
          </ol>
        </section>
      ))}
    </article>
  );
}
