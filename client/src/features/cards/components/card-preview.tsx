import { useEffect, useRef, useState } from 'react';
import { GlobalWorkerOptions, getDocument } from 'pdfjs-dist';
import workerUrl from 'pdfjs-dist/build/pdf.worker.min.mjs?url';
import { LoadingState } from '@client/components/ui/states';
import { CARD_LEFT_OFF_HEADER, type CardLeftOff } from '@shared/schemas/card';

function parseLeftOff(header: string | null): CardLeftOff[] {
  try {
    return header ? (JSON.parse(decodeURIComponent(header)) as CardLeftOff[]) : [];
  } catch {
    return [];
  }
}

/** The card PDF and, from its header, what did not fit on it. */
async function fetchCard(url: string): Promise<{ data: Uint8Array; leftOff: CardLeftOff[] }> {
  const res = await fetch(url, { credentials: 'same-origin' });
  if (!res.ok) throw new Error(`The card could not be drawn (${res.status}).`);
  const header = res.headers.get(CARD_LEFT_OFF_HEADER);
  return { data: new Uint8Array(await res.arrayBuffer()), leftOff: parseLeftOff(header) };
}

GlobalWorkerOptions.workerSrc = workerUrl;

type State = 'loading' | 'ready' | 'error';

/**
 * The card's first page drawn on a canvas with pdf.js: phones and browsers without a PDF viewer
 * (which show an empty frame or start a download) see the card as it will print.
 */
export function CardPreview({ url, ratio, onLeftOff }: { url: string; ratio: string; onLeftOff?: (leftOff: CardLeftOff[]) => void }) {
  const canvasRef = useRef<HTMLCanvasElement>(null);
  // The outcome belongs to one URL; a new URL is 'loading' until its own outcome arrives.
  const [outcome, setOutcome] = useState<{ url: string; state: Exclude<State, 'loading'> } | null>(null);
  const state: State = outcome?.url === url ? outcome.state : 'loading';
  const onLeftOffRef = useRef(onLeftOff);
  useEffect(() => {
    onLeftOffRef.current = onLeftOff;
  }, [onLeftOff]);

  useEffect(() => {
    let cancelled = false;
    // Fetched here rather than by pdf.js, so the header naming what did not fit is read with the same request.
    let loaded: { destroy: () => Promise<void> } | null = null;
    fetchCard(url)
      .then(async ({ data, leftOff }) => {
        if (cancelled) return;
        onLeftOffRef.current?.(leftOff);
        const doc = await getDocument({ data }).promise;
        loaded = doc;
        const page = await doc.getPage(1);
        const canvas = canvasRef.current;
        if (!canvas || cancelled) return;
        const cssWidth = canvas.parentElement?.clientWidth || 600;
        const scale = (cssWidth / page.getViewport({ scale: 1 }).width) * Math.min(window.devicePixelRatio || 1, 2);
        const viewport = page.getViewport({ scale });
        canvas.width = Math.floor(viewport.width);
        canvas.height = Math.floor(viewport.height);
        await page.render({ canvas, viewport }).promise;
        if (!cancelled) setOutcome({ url, state: 'ready' });
      })
      .catch(() => {
        if (!cancelled) setOutcome({ url, state: 'error' });
      });
    return () => {
      cancelled = true;
      void loaded?.destroy();
    };
  }, [url]);

  return (
    <div title="Card preview" data-src={url} data-state={state} className="relative border border-rule bg-white" style={{ aspectRatio: ratio }}>
      <canvas ref={canvasRef} aria-label="The card's first page" className={`h-full w-full ${state === 'ready' ? '' : 'invisible'}`} />
      {state === 'loading' ? (
        <div className="absolute inset-0 flex items-center justify-center">
          <LoadingState label="Drawing the card…" />
        </div>
      ) : null}
      {state === 'error' ? (
        <div role="alert" className="absolute inset-0 flex flex-col items-center justify-center gap-2 p-4 text-center">
          <p>The preview could not be drawn here.</p>
          <a href={url} target="_blank" rel="noreferrer" className="underline underline-offset-4">
            Open the PDF
          </a>
        </div>
      ) : null}
    </div>
  );
}
