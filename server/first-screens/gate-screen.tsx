import { renderToStaticMarkup } from 'react-dom/server';
import { GATE_WORDS } from '@shared/gate-phone';

/**
 * The gate's first screen as the server draws it, before the app's code arrives (seconds on one bar): the show's
 * name and the entry-number box, which takes a number at once. The send is held (early-script.ts) and the app
 * looks the car up when it takes over; the camera waits for the app. Same words and order as gate-page.tsx.
 */
export function gateScreenHtml(eventId: number, showName: string): string {
  return renderToStaticMarkup(
    <div data-early-path={`/gate/${eventId}`} className="early">
      <h1>{GATE_WORDS.heading(showName)}</h1>
      <button type="button" disabled>{GATE_WORDS.scan}</button>
      <form data-early-form="gate" method="get" action={`/gate/${eventId}`} className="early-row">
        <input name="number" inputMode="numeric" pattern="[0-9]*" autoComplete="off" aria-label={GATE_WORDS.entryNumber} placeholder={GATE_WORDS.entryNumber} />
        <button type="submit">{GATE_WORDS.find}</button>
      </form>
      <p data-early-note="" role="status" hidden>{GATE_WORDS.findingSoon}</p>
      <p>{GATE_WORDS.stillLoading}</p>
    </div>,
  );
}
