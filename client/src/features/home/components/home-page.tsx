import { Link } from 'react-router-dom';
import { useSession } from '@client/features/session/api/get-session';
import { RecentBuilds } from './recent-builds';
import { OpenShowList } from '@client/features/shows/components/shows-page';
import { useOpenShows } from '@client/features/shows/api/list-open-shows';

function OpenShows() {
  const open = useOpenShows();
  return <OpenShowList shows={open.data?.events} pending={open.isPending} error={open.error} />;
}

const audiences = [
  {
    title: 'Owners',
    body: 'Write the build sheet once: engine, drivetrain, chassis and suspension, brakes, wheels and tyres, body and interior, with who built what. Every figure says whether it was measured, estimated or is a target. Print a windshield card for each show in a minute.',
  },
  {
    title: 'Visitors',
    body: 'Scan the code on a card and the whole build opens on your phone at once, even on one bar of signal: photos, specs in your units, the story and the credits. Vote for people’s choice while voting is open.',
  },
  {
    title: 'Organisers',
    body: 'Registration, fees and classes; gate check-in by scanning the card; judges scoring on their phones, even offline; results, awards and certificates in the same place.',
  },
];

export function HomePage() {
  const { data } = useSession();
  return (
    <div>
      <section className="border-b-2 border-ink pb-8">
        <p className="font-display text-sm uppercase tracking-[0.3em] text-signal">Build sheets · Windshield cards · Shows</p>
        <h1 className="mt-2 max-w-3xl font-display text-4xl font-semibold uppercase leading-tight sm:text-6xl">The whole build, one scan away.</h1>
        <p className="mt-4 max-w-2xl text-lg text-graphite">
          Placard is for hot rods, customs and restomods: the owners who build them, the people who stop to read the card, and the crews who run the show.
        </p>
        {!data?.user ? (
          <div className="mt-6 flex flex-wrap gap-3">
            <Link to="/sign-up" className="inline-flex min-h-11 items-center border-2 border-ink bg-ink px-4 font-display uppercase tracking-wide text-paper hover:border-signal hover:bg-signal">
              Make an account
            </Link>
            <Link to="/sign-in" className="inline-flex min-h-11 items-center border-2 border-ink px-4 font-display uppercase tracking-wide hover:bg-ink hover:text-paper">
              Sign in
            </Link>
          </div>
        ) : null}
      </section>
      <section className="grid gap-0 border-b border-rule md:grid-cols-3" aria-label="Who Placard is for">
        {audiences.map((a) => (
          <article key={a.title} className="border-rule py-6 md:border-r md:px-5 md:last:border-r-0 md:first:pl-0">
            <h2 className="font-display text-2xl uppercase">{a.title}</h2>
            <p className="mt-2 text-graphite">{a.body}</p>
          </article>
        ))}
      </section>
      <section className="border-b border-rule py-8" aria-labelledby="builds-heading">
        <h2 id="builds-heading" className="mb-4 font-display text-2xl uppercase">Builds on Placard</h2>
        <RecentBuilds />
      </section>
      <section className="py-8" aria-labelledby="shows-heading">
        <h2 id="shows-heading" className="mb-4 font-display text-2xl uppercase">Shows that are on</h2>
        <OpenShows />
      </section>
    </div>
  );
}
