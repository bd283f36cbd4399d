import { useMutation } from '@tanstack/react-query';
import type { GateCard } from '@shared/schemas/show-day';
import { api } from '@client/lib/api';

/** What the gate typed or scanned: the QR code's text, or the number on the card. */
export type GateCardQuery = { code: string } | { number: number };

export const lookUpGateCard = (eventId: number, what: GateCardQuery) =>
  api<{ card: GateCard }>(`/api/events/${eventId}/gate/lookup?${new URLSearchParams('code' in what ? { code: what.code } : { number: String(what.number) })}`).then((r) => r.card);

// A mutation, not a query: each scan is asked once, when it happens, and never cached.
export const useLookUpGateCard = (eventId: number) => useMutation({ mutationFn: (what: GateCardQuery) => lookUpGateCard(eventId, what) });
