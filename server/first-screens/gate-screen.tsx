import { renderToStaticMarkup } from 'react-dom/server';
import { GATE_WORDS, PAYMENT_STATE_LABELS } from '@shared/gate-phone';

/** What the early script writes when it shows a car (the same words as the app's car card). */
const ANSWER_WORDS = {
  number: GATE_WORDS.numberPrefix,
  cls: GATE_WORDS.classPrefix,
  payment: GATE_WORDS.paymentPrefix,
  payments: PAYMENT_STATE_LABELS,
  failed: GATE_WORDS.lookUpFailed,
};

/**
 * The gate's first screen as the server draws it, before the app's code arrives (seconds on one bar): the show's
 * name and the entry-number box, which takes a number at once. A number sent is looked up at once by the page's
 * early script (the same API the app asks) and the car shown as text; the app takes the answer over and adds the
 * check-in buttons; the camera waits for the app. Same words and order as gate-page.tsx.
 */
export function gateScreenHtml(eventId: number, showName: string): string {
  return renderToStaticMarkup(
    <div data-early-path={`/gate/${eventId}`} className="early">
      <h1>{GATE_WORDS.heading(showName)}</h1>
      <button type="button" disabled>{GATE_WORDS.scan}</button>
      <form data-early-form="gate" data-early-lookup={`/api/events/${eventId}/gate/lookup`} data-early-words={JSON.stringify(ANSWER_WORDS)} method="get" action={`/gate/${eventId}`} className="early-row">
        <input name="number" inputMode="numeric" pattern="[0-9]*" autoComplete="off" aria-label={GATE_WORDS.entryNumber} placeholder={GATE_WORDS.entryNumber} />
        <button type="submit">{GATE_WORDS.find}</button>
      </form>
      <section data-early-answer="" aria-label="Scanned car" aria-live="polite" hidden />
      <p data-early-note="" role="status">{GATE_WORDS.stillLoading}</p>
    </div>,
  );
}
