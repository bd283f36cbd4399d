import { useEffect, useState, useSyncExternalStore } from 'react';
import { outboxVersion, startSendLoop, subscribe } from './outbox';
import { readLines, type LocalLine } from './sheet-store';

/** The device's lines for one show, re-read whenever the outbox changes; runs the send loop while mounted. */
export function useLocalLines(eventId: number): Record<string, LocalLine> | undefined {
  const version = useSyncExternalStore(subscribe, outboxVersion);
  const [lines, setLines] = useState<Record<string, LocalLine>>();
  useEffect(() => {
    let live = true;
    void readLines(eventId).then((l) => live && setLines(l));
    return () => {
      live = false;
    };
  }, [eventId, version]);
  useEffect(() => startSendLoop(eventId), [eventId]);
  return lines;
}
