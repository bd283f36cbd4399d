import { lazy, Suspense, useCallback, useEffect, useRef, useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { formatMoney } from '@shared/calc/money';
import { CHECK_IN_UNDO_SECONDS, GATE_WORDS, PAYMENT_STATE_LABELS } from '@shared/gate-phone';
import type { GateCard } from '@shared/schemas/show-day';
import { useShow } from '../api/get-show';
import { useCheckInAtGate } from '../api/check-in-at-gate';
import { useGateCounts } from '../api/get-gate-counts';
import { useLookUpGateCard, type GateCardQuery } from '../api/look-up-gate-card';
import { useGateRoster } from '../api/get-gate-roster';
import { queueCheckIn } from '../offline/gate-outbox';
import { lookUpOnPhone } from '../offline/local-lookup';
import { useGateQueue } from '../offline/use-gate-queue';
import { readQueue } from '../offline/gate-store';
import { GateOutboxPanel } from './gate-outbox-panel';
import { ApiError } from '@client/lib/api';
import { useOnline } from '@client/features/judging/components/use-online';
import { useUndoCheckIn } from '../api/undo-check-in';
import { useQrScanner, warmQrDecoder } from './use-qr-scanner';
import { LoadingState, ErrorState } from '@client/components/ui/states';
import { useEarlyForm } from '@client/lib/early-form';

// The walk-up form (a form library and the shared schemas) loads once the screen is up: it is for a car with no
// entry, online only, and the gate's first load on one bar stays light. The gate's worker keeps its chunk too.
const WalkUpForm = lazy(async () => ({ default: (await import('./walk-up-form')).WalkUpForm }));

const big = 'min-h-12 w-full border-2 px-4 py-3 font-display text-xl uppercase tracking-wide disabled:opacity-50';

/** Arrived / expected per class, refreshed every few seconds. */
function Counts({ eventId }: { eventId: number }) {
  const counts = useGateCounts(eventId);
  if (!counts.data) return null;
  return (
    <section aria-label="Arrived" className="mt-6 border-2 border-ink bg-white p-3">
      <p className="font-display text-2xl uppercase tabular-nums">Arrived {counts.data.arrived} / {counts.data.expected}</p>
      <ul className="mt-2 space-y-1 text-lg tabular-nums">
        {counts.data.classes.map((c) => (
          <li key={c.classId} className="flex justify-between border-b border-rule py-1">
            <span>{c.name}</span>
            <span aria-label={`${c.name}: ${c.arrived} of ${c.expected} arrived`}>{c.arrived} / {c.expected}</span>
          </li>
        ))}
      </ul>
    </section>
  );
}

/** The car that came up: photo, number, title, class, payment and the problem in words, then one big button. */
function CarCard({ eventId, card, onChange, justChecked }: { eventId: number; card: GateCard; onChange: (c: GateCard, checked: boolean) => void; justChecked: boolean }) {
  const checkIn = useCheckInAtGate(eventId);
  const [onPhone, setOnPhone] = useState(false);
  // With no signal (or when the request cannot get out) the check-in is queued on the phone and sent later.
  const check = (takeCash: boolean) => {
    const e = card.entry!;
    const queue = () => void queueCheckIn(eventId, e.number!, takeCash, e.title).then(() => setOnPhone(true));
    if (!navigator.onLine) return queue();
    checkIn.mutate({ number: e.number!, takeCash }, { onSuccess: (c) => onChange(c, true), onError: (err) => (err instanceof ApiError && err.code === 'NETWORK' ? queue() : undefined) });
  };
  const undo = useUndoCheckIn(eventId);
  const [secondsLeft, setSecondsLeft] = useState(0);
  const e = card.entry;
  useEffect(() => {
    if (!justChecked || !e?.checkedInAt) return;
    const tick = () => setSecondsLeft(Math.max(0, CHECK_IN_UNDO_SECONDS - Math.floor((Date.now() - new Date(e.checkedInAt!).getTime()) / 1000)));
    tick();
    const t = setInterval(tick, 1000);
    return () => clearInterval(t);
  }, [justChecked, e?.checkedInAt]);

  const error = (checkIn.error instanceof ApiError && checkIn.error.code === 'NETWORK' ? null : checkIn.error) ?? undo.error;
  return (
    <section aria-label="Scanned car" aria-live="polite" className="mt-4 border-2 border-ink bg-white">
      {e?.cover ? <img src={e.cover.src} width={e.cover.width} height={e.cover.height} alt="" className="aspect-[3/2] w-full object-cover" /> : null}
      <div className="p-3">
        {e ? (
          <>
            <p className="font-display text-5xl tabular-nums">{GATE_WORDS.numberPrefix}{e.number ?? '—'}</p>
            <p className="text-2xl font-semibold">{e.title}</p>
            <p className="text-xl">{GATE_WORDS.classPrefix}{e.className}</p>
            <p className="text-xl">{GATE_WORDS.paymentPrefix}{PAYMENT_STATE_LABELS[e.payment]}{e.payment === 'unpaid' ? ` (${formatMoney(e.feeAmount, e.currency)})` : ''}</p>
          </>
        ) : null}
        {justChecked ? <p role="status" className="mt-3 border-l-8 border-ok bg-ok/10 p-3 text-2xl font-semibold">Checked in.</p> : null}
        {onPhone ? <p role="status" className="mt-3 border-l-8 border-ok bg-ok/10 p-3 text-2xl font-semibold">Checked in on this phone. It goes to the server when the signal returns.</p> : null}
        {card.message && !justChecked && !onPhone ? <p role="alert" className="mt-3 border-l-8 border-danger bg-danger/10 p-3 text-xl font-semibold">{card.message}</p> : null}
        {error ? <p role="alert" className="mt-3 border-l-8 border-danger p-3 text-xl">{error.message}</p> : null}
        {e && card.canCheckIn && !onPhone ? (
          <button type="button" className={`${big} mt-3 border-ink bg-ink text-paper`} disabled={checkIn.isPending} onClick={() => check(false)}>
            Check in
          </button>
        ) : null}
        {e && card.canTakeCash && !onPhone ? (
          <button type="button" className={`${big} mt-3 border-ink bg-ink text-paper`} disabled={checkIn.isPending} onClick={() => check(true)}>
            Take {formatMoney(e.feeAmount, e.currency)} cash and check in
          </button>
        ) : null}
        {e && justChecked && secondsLeft > 0 ? (
          <button type="button" className={`${big} mt-3 border-ink bg-paper text-ink`} disabled={undo.isPending} onClick={() => undo.mutate(e.id, { onSuccess: (c) => onChange(c, false) })}>
            Undo ({secondsLeft} s)
          </button>
        ) : null}
      </div>
    </section>
  );
}

/** Gate check-in on a phone: scan the card's QR code or type the number; with no signal, from the phone's copy of the show. */
export function GatePage() {
  const eventId = Number(useParams().id);
  const online = useOnline();
  const show = useShow(eventId);
  const roster = useGateRoster(eventId, show.data ? show.data.abilities.checkIn : show.isError);
  const queue = useGateQueue(eventId);
  const lookUp = useLookUpGateCard(eventId);
  const counts = useGateCounts(eventId);
  const [notFound, setNotFound] = useState<string | null>(null);
  const [justChecked, setJustChecked] = useState(false);
  const [camera, setCamera] = useState(false);
  // The number typed (and perhaps sent) on the gate the server drew before this code arrived carries on here.
  const early = useEarlyForm('gate');
  const [typed, setTyped] = useState(() => (early?.values.number ?? '').replace(/\D/g, ''));
  // The car the drawn gate already found (the same API's answer, kept on its form) stays up: no second look-up.
  const [card, setCard] = useState<GateCard | null>(() => (early?.answer as { card?: GateCard } | null)?.card ?? null);
  const earlySend = useRef((early?.sent ?? false) && !card);
  const found = (c: GateCard) => {
    setCard(c);
    setNotFound(null);
    setJustChecked(false);
  };
  const find = useCallback(
    (what: GateCardQuery) => {
      const onPhone = async () => {
        if (!roster.data) return setNotFound('No signal, and this phone has no copy of the show yet.');
        const local = lookUpOnPhone(roster.data, await readQueue(eventId), what);
        if ('notFound' in local) {
          setCard(null);
          setNotFound(local.notFound);
        } else found(local);
      };
      if (!navigator.onLine) return void onPhone();
      lookUp.mutate(what, { onSuccess: found, onError: (err) => (err instanceof ApiError && err.code === 'NETWORK' ? void onPhone() : setNotFound(null)) });
    },
    [lookUp, roster.data, eventId],
  );
  const onCode = useCallback((text: string) => find({ code: text }), [find]);
  useEffect(() => {
    // Scoped to /gate: keeps this screen's shell on the phone so it reloads with no signal.
    if ('serviceWorker' in navigator && import.meta.env.PROD) void navigator.serviceWorker.register('/gate-sw.js', { scope: '/gate' });
    warmQrDecoder();
  }, []);
  const { videoRef, error: cameraError } = useQrScanner(camera, onCode);

  const name = show.data?.name ?? roster.data?.show.name;
  const open = show.data?.abilities.checkIn ?? roster.data?.show.checkIn ?? false;
  useEffect(() => {
    // Sent before the code arrived: looked up once the gate is known to be open (a closed gate says why instead).
    if (!open || !earlySend.current) return;
    earlySend.current = false;
    const n = Number(typed);
    if (Number.isInteger(n) && n > 0) find({ number: n });
  }, [open, typed, find]);
  if (!name && (show.isPending || (roster.isPending && roster.fetchStatus !== 'idle'))) return <LoadingState />;
  if (!name) return <ErrorState error={show.error ?? roster.error} />;
  const lookUpError = lookUp.error instanceof ApiError && lookUp.error.code === 'NETWORK' ? null : lookUp.error;
  return (
    <div className="mx-auto max-w-md text-lg">
      <div className="flex items-baseline justify-between gap-2">
        <h1 className="font-display text-3xl uppercase">{GATE_WORDS.heading(name)}</h1>
        <span role="status" className={`shrink-0 font-display text-sm uppercase tracking-wide ${online ? 'text-ok' : 'text-danger'}`}>{online ? 'Online' : 'No signal'}</span>
      </div>
      {!open ? <p role="alert" className="mt-3 border-l-8 border-caution p-3">The gate opens on show day; an organiser opens it from the show's steps.</p> : null}
      {open ? (
        <>
          <div className="mt-3 border-2 border-ink bg-ink">
            {camera ? <video ref={videoRef} muted playsInline aria-label="Camera" className="aspect-square w-full object-cover" /> : null}
            <button type="button" className={`${big} border-ink ${camera ? 'bg-paper text-ink' : 'bg-signal-ink text-paper'}`} onClick={() => setCamera((c) => !c)}>
              {camera ? 'Stop camera' : GATE_WORDS.scan}
            </button>
          </div>
          {cameraError ? <p role="alert" className="mt-2 text-danger">{cameraError}</p> : null}
          <form
            className="mt-3 flex gap-2"
            onSubmit={(ev) => {
              ev.preventDefault();
              const n = Number(typed);
              if (Number.isInteger(n) && n > 0) find({ number: n });
            }}
          >
            <input inputMode="numeric" pattern="[0-9]*" aria-label={GATE_WORDS.entryNumber} placeholder={GATE_WORDS.entryNumber} autoFocus={early?.focused === 'number'} value={typed} onChange={(e) => setTyped(e.target.value.replace(/\D/g, ''))} className="min-h-12 min-w-0 flex-1 border-2 border-ink bg-white px-3 text-2xl tabular-nums" />
            <button type="submit" className="min-h-12 min-w-24 shrink-0 border-2 border-ink bg-ink px-4 font-display text-xl uppercase text-paper">{GATE_WORDS.find}</button>
          </form>
          {lookUp.isPending ? <LoadingState label="Looking up…" /> : null}
          {lookUpError ? <p role="alert" className="mt-3 border-l-8 border-danger p-3 text-xl font-semibold">{lookUpError.message}</p> : null}
          {notFound ? <p role="alert" className="mt-3 border-l-8 border-danger p-3 text-xl font-semibold">{notFound}</p> : null}
          {card && !lookUp.isPending && !lookUpError ? (
            <CarCard
              key={`${card.entry?.id ?? 'none'}-${card.problem}-${card.entry?.checkedInAt ?? ''}`}
              eventId={eventId}
              card={card}
              justChecked={justChecked}
              onChange={(c, checked) => {
                setCard(c);
                setJustChecked(checked);
              }}
            />
          ) : null}
          <GateOutboxPanel queue={queue} />
          {online && counts.data ? <Suspense fallback={null}><WalkUpForm eventId={eventId} classes={counts.data.classes} fee={show.data && show.data.entryFee > 0 ? { amount: show.data.entryFee, currency: show.data.currency } : null} onEntered={(c) => { setCard(c); setJustChecked(true); setNotFound(null); }} /></Suspense> : null}
          {online ? <Counts eventId={eventId} /> : null}
        </>
      ) : null}
      {/* The way to another show's gate, or out: the gate sits outside the app's menu. Its screens need the signal. */}
      {online ? (
        <p className="mt-8">
          <Link to="/shows" className="inline-flex min-h-11 items-center underline">Your shows</Link>
        </p>
      ) : null}
    </div>
  );
}
