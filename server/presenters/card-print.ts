import { printStalled, type CardPrint as CardPrintBody } from '@shared/schemas/card-print';
import type { CardPrint } from '../models/card-print';
import { config } from '../config';

/** A bulk print as the organiser's screen reads it; the file is offered by URL once it is ready. */
export function presentCardPrint(print: CardPrint): CardPrintBody {
  return {
    id: print.id,
    eventId: print.eventId,
    classId: print.classId,
    className: print.eventClass?.name ?? null,
    status: print.status,
    done: print.done,
    total: print.total,
    rendered: print.rendered,
    startedBy: print.starter?.name ?? '',
    startedAt: print.createdAt.toISOString(),
    finishedAt: print.finishedAt ? print.finishedAt.toISOString() : null,
    downloadUrl: print.status === 'done' ? `/api/events/${print.eventId}/card-prints/${print.id}/cards.pdf` : null,
    error: print.error,
    stalled: printStalled(print.status, print.heartbeatAt, config.cardPrintStaleSeconds),
  };
}
