import { useEffect, useRef, useState, type RefObject } from 'react';
import { everyVideoFrame } from './frame-loop';
import { loadQrDecoder, type ScanPath } from './qr-decoder';

export type CameraState =
  | { kind: 'starting' }
  | { kind: 'scanning'; path: ScanPath; firstDecodeMs?: number }
  | { kind: 'failed'; message: string };

function cameraProblem(err: unknown): string {
  const name = (err as { name?: string }).name;
  if (name === 'NotAllowedError') return 'Gripline may not use the camera. Allow it in the browser settings, or type the code below.';
  if (name === 'NotFoundError' || name === 'OverconstrainedError') return 'No camera was found. Type the code below, or use a USB scanner.';
  if (!window.isSecureContext) return 'The camera works only over HTTPS (or on localhost). Type the code below.';
  return 'The camera did not start. Type the code below, or try again.';
}

/**
 * How long a code must be out of sight before the camera reports it again: held in front of the lens
 * it is reported once, taken away and shown again it is reported anew (a badge refused and tried again).
 */
export const CODE_GONE_MS = 1_000;

/**
 * The rear camera in the returned video element, its frames decoded until the screen closes. Each
 * code is reported once while it stays in sight (see `CODE_GONE_MS`). The time from the stream playing
 * to the first code read is kept (and logged) with the decoder that read it.
 */
export function useQrCamera(onCode: (code: string) => void): [CameraState, RefObject<HTMLVideoElement | null>] {
  const video = useRef<HTMLVideoElement>(null);
  const [state, setState] = useState<CameraState>({ kind: 'starting' });
  const onCodeRef = useRef(onCode);
  useEffect(() => {
    onCodeRef.current = onCode;
  });

  useEffect(() => {
    let cancelled = false;
    let stream: MediaStream | undefined;
    let stopFrames = () => {};
    void (async () => {
      try {
        if (!navigator.mediaDevices?.getUserMedia) throw Object.assign(new Error('no media devices'), { name: window.isSecureContext ? 'NotFoundError' : 'Insecure' });
        // Fetched while the camera starts; a camera that never starts leaves its failure unheard.
        const decoder = loadQrDecoder();
        decoder.catch(() => {});
        stream = await navigator.mediaDevices.getUserMedia({ video: { facingMode: { ideal: 'environment' } }, audio: false });
        const element = video.current;
        if (cancelled || !element) return stream.getTracks().forEach((track) => track.stop());
        element.srcObject = stream;
        await element.play();
        const playingAt = performance.now();
        const qr = await decoder;
        const path = qr.path;
        if (cancelled) return;
        setState({ kind: 'scanning', path });
        const sighting = codeSighting();
        let readOnce = false;
        stopFrames = everyVideoFrame(element, async () => {
          const text = (await qr.read(element))?.trim();
          const fresh = sighting.isNew(text, performance.now());
          if (cancelled || !text || !fresh) return;
          if (!readOnce) {
            readOnce = true;
            const firstDecodeMs = Math.round(performance.now() - playingAt);
            console.debug(`Gripline scanner: first code after ${firstDecodeMs} ms (path ${path})`);
            setState({ kind: 'scanning', path, firstDecodeMs });
          }
          onCodeRef.current(text);
        });
      } catch (err) {
        if (!cancelled) setState({ kind: 'failed', message: cameraProblem(err) });
      }
    })();
    return () => {
      cancelled = true;
      stopFrames();
      stream?.getTracks().forEach((track) => track.stop());
    };
  }, []);

  return [state, video];
}

/**
 * Which frame's code is new: a different code, or the same one after it has been out of sight for
 * `goneMs`. Frames where nothing is read count as out of sight.
 */
export function codeSighting(goneMs = CODE_GONE_MS) {
  let last = '';
  let seenAt = 0;
  return {
    isNew(text: string | undefined, now: number): boolean {
      if (!text) {
        if (last && now - seenAt >= goneMs) last = '';
        return false;
      }
      const fresh = text !== last;
      last = text;
      seenAt = now;
      return fresh;
    },
  };
}
