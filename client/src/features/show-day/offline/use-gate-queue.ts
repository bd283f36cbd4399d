import { useEffect, useState } from 'react';
import { readQueue, type QueuedCheckIn } from './gate-store';
import { startGateSendLoop, subscribeToGateOutbox } from './gate-outbox';

/** The phone's queued check-ins of a show, kept current, with the send loop running while the screen is open. */
export function useGateQueue(eventId: number): Record<string, QueuedCheckIn> {
  const [queue, setQueue] = useState<Record<string, QueuedCheckIn>>({});
  useEffect(() => {
    const load = () => void readQueue(eventId).then(setQueue);
    load();
    const unsubscribe = subscribeToGateOutbox(load);
    const stop = startGateSendLoop(eventId);
    return () => {
      unsubscribe();
      stop();
    };
  }, [eventId]);
  return queue;
}
