import { Link } from 'react-router-dom';
import type { EventDetail } from '@shared/schemas/show';
import { Panel } from '@client/components/ui/panel';
import { showTime } from './show-dates';

/** Where gate staff start: the scanner on show day and during judging (late arrivals), otherwise when it opens. */
export function GatePanel({ show }: { show: EventDetail }) {
  return (
    <Panel title="Gate">
      {show.abilities.checkIn ? (
        <Link to={`/gate/${show.id}`} className="inline-flex min-h-12 items-center rounded bg-ink px-5 font-display text-lg text-paper">
          Check cars in
        </Link>
      ) : (
        <p>Check-in opens on show day, when the organiser starts show day. The show starts {showTime(show.startsAt, show.timeZone)} at {show.venueName}.</p>
      )}
    </Panel>
  );
}
