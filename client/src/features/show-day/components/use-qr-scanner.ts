import { useEffect, useRef, useState } from 'react';

type Detector = { detect(source: CanvasImageSource): Promise<Array<{ rawValue: string }>> };
type DetectorCtor = new (opts: { formats: string[] }) => Detector;

/** The browser's own QR reader where there is one (Chrome on Android, Safari); else jsqr on canvas frames. */
async function makeReader(): Promise<(video: HTMLVideoElement, canvas: HTMLCanvasElement) => Promise<string | null>> {
  const Native = (globalThis as { BarcodeDetector?: DetectorCtor & { getSupportedFormats?: () => Promise<string[]> } }).BarcodeDetector;
  if (Native && (await Native.getSupportedFormats?.())?.includes('qr_code')) {
    const detector = new Native({ formats: ['qr_code'] });
    return async (video) => (await detector.detect(video))[0]?.rawValue ?? null;
  }
  // The decoder is a chunk of its own, off the gate's first load on a weak signal (see warmQrDecoder).
  const { default: jsQR } = await import('jsqr');
  return async (video, canvas) => {
    // A 640 px frame is enough for a card held at arm's length and keeps a weak phone quick.
    const scale = Math.min(1, 640 / Math.max(video.videoWidth, video.videoHeight));
    canvas.width = Math.round(video.videoWidth * scale);
    canvas.height = Math.round(video.videoHeight * scale);
    const ctx = canvas.getContext('2d', { willReadFrequently: true });
    if (!ctx || !canvas.width) return null;
    ctx.drawImage(video, 0, 0, canvas.width, canvas.height);
    const image = ctx.getImageData(0, 0, canvas.width, canvas.height);
    return jsQR(image.data, image.width, image.height, { inversionAttempts: 'dontInvert' })?.data ?? null;
  };
}

/**
 * Fetches the fallback decoder once the gate has drawn, so the service worker keeps it for a scan
 * started later with no signal; until then it costs the first load nothing.
 */
export function warmQrDecoder() {
  const idle = (globalThis as { requestIdleCallback?: (cb: () => void) => number }).requestIdleCallback ?? ((cb: () => void) => setTimeout(cb, 1000));
  const fetchIt = () => idle(() => void import('jsqr').catch(() => undefined));
  const workers = 'serviceWorker' in navigator ? navigator.serviceWorker : null;
  // Through the service worker once it controls the page (it claims it on first install), so the chunk is kept.
  if (!workers || workers.controller || !import.meta.env.PROD) fetchIt();
  else workers.addEventListener('controllerchange', fetchIt, { once: true });
}

/**
 * Reads QR codes from the rear camera while `active`. Calls `onCode` once per new code; the same
 * code is not reported again until another one (or nothing) has been seen, so a card held still
 * does not look up twice.
 */
export function useQrScanner(active: boolean, onCode: (text: string) => void) {
  const videoRef = useRef<HTMLVideoElement>(null);
  const [error, setError] = useState<string | null>(null);
  const onCodeRef = useRef(onCode);
  useEffect(() => {
    onCodeRef.current = onCode;
  }, [onCode]);

  useEffect(() => {
    if (!active) return;
    let stopped = false;
    let stream: MediaStream | null = null;
    let last: string | null = null;
    const canvas = document.createElement('canvas');
    (async () => {
      try {
        stream = await navigator.mediaDevices.getUserMedia({ video: { facingMode: 'environment' }, audio: false });
      } catch {
        setError('No camera: allow the camera for this page, or type the entry number.');
        return;
      }
      const video = videoRef.current;
      if (!video || stopped) return;
      video.srcObject = stream;
      await video.play().catch(() => undefined);
      const read = await makeReader();
      while (!stopped) {
        if (video.readyState >= 2) {
          const text = await read(video, canvas).catch(() => null);
          if (text && text !== last) onCodeRef.current(text);
          last = text;
        }
        await new Promise((r) => setTimeout(r, 150));
      }
    })();
    return () => {
      stopped = true;
      stream?.getTracks().forEach((t) => t.stop());
    };
  }, [active]);

  return { videoRef, error };
}
