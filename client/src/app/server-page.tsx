import { useEffect } from 'react';
import { LoadingState } from '@client/components/ui/states';

/**
 * A page the server renders (the home page, the list of builds): reached inside the app, the browser
 * loads it from the server instead, so there is one home page, readable without script.
 */
export function ServerPage() {
  useEffect(() => {
    window.location.replace(window.location.pathname + window.location.search);
  }, []);
  return <LoadingState label="Loading…" />;
}
