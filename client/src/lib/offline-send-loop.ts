import { ApiError } from './api';

/**
 * Whether a failed send of an offline queue was refused for good (the person sees why), rather than
 * to be tried again later: no signal, the server busy or away, the session to be renewed.
 */
export const refusedForGood = (err: unknown): err is ApiError =>
  err instanceof ApiError && err.code !== 'NETWORK' && err.status < 500 && err.status !== 429 && err.status !== 401;

/** Sends a phone's queue now, when the signal returns and every few seconds; returns the function that stops it. */
export function startOfflineSendLoop(flush: () => Promise<void>, everyMs = 5000): () => void {
  const kick = () => void flush();
  kick();
  window.addEventListener('online', kick);
  const timer = window.setInterval(kick, everyMs);
  return () => {
    window.removeEventListener('online', kick);
    window.clearInterval(timer);
  };
}
