import { useEffect, useRef, useState } from 'react';
import { Notice } from '@/components/ui/notice';

type State = { kind: 'starting' } | { kind: 'scanning' } | { kind: 'failed'; message: string };

function cameraProblem(err: unknown): string {
  const name = (err as { name?: string }).name;
  if (name === 'NotAllowedError') return 'Gripline may not use the camera. Allow it in the browser settings, or type the code below.';
  if (name === 'NotFoundError' || name === 'OverconstrainedError') return 'No camera was found. Type the code below, or use a USB scanner.';
  if (!window.isSecureContext) return 'The camera works only over HTTPS (or on localhost). Type the code below.';
  return 'The camera did not start. Type the code below, or try again.';
}

/**
 * The rear camera reading QR labels. The decoder library is large, so it loads only here, when
 * this screen opens. Each code is reported once until the camera sees a different one.
 */
export function CameraScanner({ onCode }: { onCode: (code: string) => void }) {
  const video = useRef<HTMLVideoElement>(null);
  const [state, setState] = useState<State>({ kind: 'starting' });
  const onCodeRef = useRef(onCode);
  useEffect(() => {
    onCodeRef.current = onCode;
  });

  useEffect(() => {
    let stop: (() => void) | undefined;
    let cancelled = false;
    let last = '';
    void (async () => {
      try {
        if (!navigator.mediaDevices?.getUserMedia) throw Object.assign(new Error('no media devices'), { name: window.isSecureContext ? 'NotFoundError' : 'Insecure' });
        const { BrowserQRCodeReader } = await import('@zxing/browser');
        if (cancelled || !video.current) return;
        const reader = new BrowserQRCodeReader(undefined, { delayBetweenScanAttempts: 150 });
        const controls = await reader.decodeFromConstraints({ video: { facingMode: { ideal: 'environment' } } }, video.current, (result) => {
          const text = result?.getText().trim();
          if (text && text !== last) {
            last = text;
            onCodeRef.current(text);
          }
        });
        stop = () => controls.stop();
        if (cancelled) stop();
        else setState({ kind: 'scanning' });
      } catch (err) {
        if (!cancelled) setState({ kind: 'failed', message: cameraProblem(err) });
      }
    })();
    return () => {
      cancelled = true;
      stop?.();
    };
  }, []);

  return (
    <div className="flex flex-col gap-2">
      {state.kind === 'failed' ? (
        <Notice tone="warn" title="Camera">
          {state.message}
        </Notice>
      ) : (
        <div className="relative overflow-hidden rounded-xl bg-ink">
          <video ref={video} muted playsInline className="aspect-[4/3] w-full object-cover" aria-label="Camera view" />
          <div aria-hidden className="pointer-events-none absolute inset-[18%] rounded-lg border-4 border-brass/80" />
          <p role="status" className="absolute inset-x-0 bottom-0 bg-ink/70 px-3 py-2 text-center text-card">
            {state.kind === 'starting' ? 'Starting the camera…' : 'Point the camera at the QR label'}
          </p>
        </div>
      )}
    </div>
  );
}
