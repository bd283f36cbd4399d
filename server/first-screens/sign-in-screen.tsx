import { renderToStaticMarkup } from 'react-dom/server';
import { SIGN_IN_WORDS } from '@shared/sign-in-words';

/**
 * The sign-in form as the server draws it, before the app's code arrives (seconds on one bar): the person types
 * at once; a send is held (early-script.ts) and the app signs in with what was typed when it takes over. It never
 * posts by itself: a password goes only to the API, with the CSRF token the app holds.
 */
export function signInScreenHtml(): string {
  return renderToStaticMarkup(
    <div data-early-path="/sign-in" className="early">
      <h1>{SIGN_IN_WORDS.heading}</h1>
      <form data-early-form="sign-in" method="post" action="/sign-in" className="early-stack">
        <label>
          {SIGN_IN_WORDS.email}
          <input name="email" type="email" autoComplete="email" inputMode="email" required />
        </label>
        <label>
          {SIGN_IN_WORDS.password}
          <input name="password" type="password" autoComplete="current-password" required />
        </label>
        <button type="submit">{SIGN_IN_WORDS.send}</button>
      </form>
      <p data-early-note="" role="status" hidden>{SIGN_IN_WORDS.signingInSoon}</p>
    </div>,
  );
}
