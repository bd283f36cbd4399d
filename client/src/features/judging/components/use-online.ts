import { useSyncExternalStore } from 'react';

const subscribe = (cb: () => void) => {
  window.addEventListener('online', cb);
  window.addEventListener('offline', cb);
  return () => {
    window.removeEventListener('online', cb);
    window.removeEventListener('offline', cb);
  };
};

/** The browser's idea of the connection: a hint for the screen, never a reason to skip writing to the device. */
export const useOnline = () => useSyncExternalStore(subscribe, () => navigator.onLine);
