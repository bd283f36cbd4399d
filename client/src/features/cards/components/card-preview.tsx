import { useEffect, useRef, useState } from 'react';
import { GlobalWorkerOptions, getDocument } from 'pdfjs-dist';
import workerUrl from 'pdfjs-dist/build/pdf.worker.min.mjs?url';
import { LoadingState } from '@client/components/ui/states';

GlobalWorkerOptions.workerSrc = workerUrl;

type State = 'loading' | 'ready' | 'error';

/**
 * The card's first page drawn on a canvas with pdf.js: phones and browsers without a PDF viewer
 * (which show an empty frame or start a download) see the card as it will print.
 */
export function CardPreview({ url, ratio }: { url: string; ratio: string }) {
  const canvasRef = useRef<HTMLCanvasElement>(null);
  // The outcome belongs to one URL; a new URL is 'loading' until its own outcome arrives.
  const [outcome, setOutcome] = useState<{ url: string; state: Exclude<State, 'loading'> } | null>(null);
  const state: State = outcome?.url === url ? outcome.state : 'loading';

  useEffect(() => {
    let cancelled = false;
    const task = getDocument({ url, withCredentials: true });
    task.promise
      .then(async (doc) => {
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
      void task.destroy();
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
