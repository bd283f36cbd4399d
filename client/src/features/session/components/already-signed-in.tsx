import { Link } from 'react-router-dom';
import { Notice } from '@client/components/ui/notice';
import { PageHeader } from '@client/components/ui/page-header';

/** Sign-in and sign-up opened by someone already signed in: say so, rather than offer a second account's form. */
export function AlreadySignedIn({ title, name, next }: { title: string; name: string; next: string }) {
  return (
    <div className="mx-auto max-w-md">
      <PageHeader title={title} />
      <Notice tone="ok">
        <p>You are signed in as {name}. To use another account, sign out first (at the top of the page).</p>
      </Notice>
      <Link to={next} className="mt-4 inline-flex min-h-11 items-center border-2 border-ink bg-ink px-4 font-display uppercase tracking-wide text-paper hover:border-signal hover:bg-signal">
        {next === '/builds' ? 'Go to my builds' : 'Carry on'}
      </Link>
    </div>
  );
}
