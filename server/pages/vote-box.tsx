import { renderToStaticMarkup } from 'react-dom/server';
import { OSWALD_URL } from './page-styles';

/**
 * The public page is cached and shared by every visitor; the vote part is each visitor's own (their
 * form token, whether they voted). The cached HTML holds this mark where the vote box goes, and each
 * response puts the visitor's box in its place, so no visitor's state is ever in the shared copy.
 */
export const voteBoxMark = (eventId: number) => `<div data-vote-box="${eventId}"></div>`;

/** `anchor` names the box on the page (one per show the car is in), where a counted vote lands the visitor. */
export type VoteBoxState = { anchor: string } & ({ kind: 'open'; url: string; formToken: string } | { kind: 'voted'; thisCar: boolean; number: number | null });

function VoteBox({ state }: { state: VoteBoxState }) {
  if (state.kind === 'voted') {
    return (
      <div id={state.anchor} className="vote" role="status">
        <p className="voted">
          <strong>Thank you for voting.</strong> Your people’s choice vote in this show went to {state.thisCar ? 'this car' : state.number ? `entry ${state.number}` : 'another car'}. One vote per visitor.
        </p>
      </div>
    );
  }
  return (
    <div id={state.anchor} className="vote">
      <form method="post" action={state.url}>
        <input type="hidden" name="token" value={state.formToken} />
        <button type="submit" className="vbtn">
          Vote for this car
        </button>
      </form>
      <p className="vnote">People’s choice: one vote per visitor in this show.</p>
    </div>
  );
}

export const renderVoteBox = (state: VoteBoxState) => renderToStaticMarkup(<VoteBox state={state} />);

export type VoteRefusal = 'twice' | 'closed' | 'not-entered' | 'stale-form' | 'too-many' | 'unreadable' | 'unavailable';

const REFUSALS: Record<VoteRefusal, { status: number; title: string; text: (n: number | null) => string }> = {
  twice: {
    status: 409,
    title: 'You have already voted',
    text: (n) => `You already voted in this show${n ? `, for entry ${n}` : ''}. It is one vote per visitor, so this one was not counted.`,
  },
  closed: { status: 409, title: 'Voting is not open', text: () => 'People’s choice voting for this show is not open right now, so this vote was not counted.' },
  'not-entered': { status: 404, title: 'This car is not in a show now', text: () => 'There is no people’s choice vote for this car at the moment.' },
  'stale-form': {
    status: 403,
    title: 'This vote could not be checked',
    text: () => 'The form was out of date or did not come from this car’s page. Open the car’s page again and press the vote button there.',
  },
  'too-many': { status: 429, title: 'Too many votes from this network', text: () => 'Many votes came from your network in a short time. Wait a while, then try again.' },
  unreadable: { status: 400, title: 'This vote could not be read', text: () => 'Open the car’s page again and press the vote button there.' },
  unavailable: { status: 503, title: 'Votes cannot be counted right now', text: () => 'This vote was not counted. Go back to the car’s page and press the button again in a minute.' },
};

/** A whole page for a vote that was not counted: the reason in words, and the way back to the car. */
export function renderVoteRefusal(reason: VoteRefusal, backUrl: string, votedNumber: number | null = null): { status: number; html: string } {
  const r = REFUSALS[reason];
  const body = renderToStaticMarkup(
    <main>
      <h1>{r.title}</h1>
      <p>{r.text(votedNumber)}</p>
      <p>
        <a href={backUrl}>Back to the car</a>
      </p>
    </main>,
  );
  const html = `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"><meta name="robots" content="noindex"><title>${r.title} · Placard</title><style>@font-face{font-family:Oswald;font-weight:600;font-display:swap;src:url(${OSWALD_URL}) format("woff2")}html{background:#F5F0E6;color:#1C1B19;font:16px/1.5 system-ui,sans-serif}main{max-width:560px;margin:12vh auto;padding:0 16px}h1{font:600 2rem/1.1 Oswald,"Arial Narrow",sans-serif;text-transform:uppercase}a{display:inline-block;min-height:44px;line-height:44px;color:inherit}</style></head><body>${body}</body></html>`;
  return { status: r.status, html };
}
