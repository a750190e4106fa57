import { Notice } from '@/components/ui/notice';
import { useQrCamera } from '../scanner/use-qr-camera';

/**
 * The rear camera reading QR labels, with the browser's own detector or, where there is none, the
 * decoder library (loaded only then). The element says which one read and how soon the first code
 * came after the camera started (`data-scan-path`, `data-first-decode-ms`).
 */
export function CameraScanner({ onCode }: { onCode: (code: string) => void }) {
  const [state, video] = useQrCamera(onCode);
  const scanning = state.kind === 'scanning' ? state : undefined;

  return (
    <div className="flex flex-col gap-2" data-scan-path={scanning?.path} data-first-decode-ms={scanning?.firstDecodeMs}>
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
