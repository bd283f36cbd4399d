// The sign-in form's words, the same on the form the server draws first (server/first-screens) and the app's.
export const SIGN_IN_WORDS = {
  heading: 'Sign in',
  email: 'E-mail',
  password: 'Password',
  send: 'Sign in',
  /** Shown when the form is sent before the app's code has arrived: the app sends it on arrival. */
  signingInSoon: 'Signing you in as soon as the page has finished loading…',
} as const;
