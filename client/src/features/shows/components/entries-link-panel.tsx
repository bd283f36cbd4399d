import { Link } from 'react-router-dom';
import type { EventDetail } from '@shared/schemas/show';
import { Panel } from '@client/components/ui/panel';

/** The organiser's way into the entries table, where every entry action and its history live. */
export function EntriesLinkPanel({ show }: { show: EventDetail }) {
  return (
    <Panel title="Entries">
      <p className="mb-3">Numbers, payments, arrivals and the waiting list; change a class, mark paid, withdraw, export CSV.</p>
      <Link to={`/shows/${show.id}/entries`} className="inline-flex min-h-12 items-center rounded bg-ink px-5 font-display text-lg text-paper">
        Open the entries table
      </Link>
    </Panel>
  );
}
