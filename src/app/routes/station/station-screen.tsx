import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useRef, useState } from 'react';
import { toast } from 'sonner';
import { STATION_IDLE_SECONDS } from '@shared/schemas/stations';
import { stationSignInWords } from '@shared/stations/station-sign-in-rules';
import { forgetStationCopy } from '@/features/offline/api/station-copy';
import { stopStationReplay } from '@/features/offline/api/station-replay';
import { holderOf, signInFromCopy } from '@/features/offline/api/station-sign-in';
import { StationCopyStatus } from '@/features/offline/components/station-copy-status';
import { StationQueuePanel } from '@/features/offline/components/station-queue-panel';
import { isOffline, useOffline } from '@/features/offline/connection';
import type { StoredStationCopy } from '@/features/offline/db';
import { useStationSync } from '@/features/offline/station-sync';
import type { KeptStation } from '@/features/stations/api/kept-station';
import { endStationSession, endsStationSession, KEEP_ALIVE_EVERY_MS, keepStationSessionAlive, useStationSignIn } from '@/features/stations/api/station-session';
import { IdleCountdown } from '@/features/stations/components/idle-countdown';
import { PinPad } from '@/features/stations/components/pin-pad';
import { ScanEntry } from '@/features/stations/components/scan-entry';
import { afterRefusedSignIn, NO_LABEL_YET, NOT_A_BADGE, type StationStep } from '@/features/stations/hooks/station-steps';
import { useIdleCountdown } from '@/features/stations/hooks/use-idle-countdown';
import { Button } from '@/components/ui/button';
import { PageHeading } from '@/components/ui/page';
import { isNoConnection } from '@/lib/api-client';
import { useJustLeft } from './just-left';
import { readScan } from './read-scan';
import { SignedIn, StationCamera, StationNotice } from './signed-in';

export const STATION_SCREEN_CLASS = 'min-h-dvh bg-ink px-4 py-6 text-card sm:px-8';

/** The station's steps: badge, PIN, signed in; online by the server, offline by the station's copy. */
export function StationScreen({ station, onRevoked }: { station: KeptStation; onRevoked: () => void }) {
  const queryClient = useQueryClient();
  const offline = useOffline();
  const signIn = useStationSignIn();
  const [step, setStep] = useState<StationStep>({ kind: 'badge' });
  const [checking, setChecking] = useState(false);
  const signedIn = step.kind === 'signed-in';
  const liveSession = signedIn && !step.offline;

  const revoked = useCallback(() => {
    forgetStationCopy(station.id).catch(() => undefined);
    onRevoked();
  }, [station.id, onRevoked]);
  const sync = useStationSync({ stationId: station.id, mayReplay: step.kind === 'badge', mayTakeCopy: !liveSession, onNotEnrolled: onRevoked, endSession: endStationSession });
  // What handlers finishing later (a sign-in's answer, an idle end) read: the copy and step of now.
  const stored = useRef(sync.copy);
  const current = useRef(step);
  useEffect(() => {
    stored.current = sync.copy;
    current.current = step;
  });

  /** Back to "Scan your badge" with nothing of the last person left: no cached answers, no toasts. */
  const clearPerson = useCallback(
    (next: StationStep) => {
      setStep(next);
      toast.dismiss();
      queryClient.clear();
    },
    [queryClient],
  );
  const justLeft = useJustLeft();
  /** A session ends (Done, idle, the next badge): the server's is ended, then a fresh copy, then the queue. */
  const done = useCallback(
    (next: StationStep = { kind: 'badge' }) => {
      const ending = current.current;
      if (ending.kind === 'signed-in') justLeft.mark(ending.badge);
      clearPerson(next);
      const ended = ending.kind === 'signed-in' && !ending.offline ? endStationSession() : Promise.resolve();
      void ended.then(sync.sync);
    },
    [clearPerson, sync.sync, justLeft],
  );

  const idle = useIdleCountdown(signedIn, signedIn ? step.idleSeconds : STATION_IDLE_SECONDS, () =>
    done({ kind: 'badge', notice: 'Signed out after a minute without a scan or tap.' }),
  );

  /** An answer saying the session is over (idle on the server, station revoked) ends it here too. */
  const endedBy = useCallback(
    (err: unknown) => {
      const ended = endsStationSession(err);
      if (ended === 'not-enrolled') revoked();
      else if (ended === 'ended') clearPerson({ kind: 'badge', notice: 'The station signed you out. Scan your badge to go on.' });
    },
    [revoked, clearPerson],
  );
  useEffect(() => {
    if (!liveSession) return;
    const offQueries = queryClient.getQueryCache().subscribe((e) => {
      if (e.type === 'updated' && e.action.type === 'error') endedBy(e.action.error);
    });
    const offMutations = queryClient.getMutationCache().subscribe((e) => {
      if (e.type === 'updated' && e.action.type === 'error') endedBy(e.action.error);
    });
    return () => {
      offQueries();
      offMutations();
    };
  }, [liveSession, queryClient, endedBy]);

  /** A scan or tap: the minute starts over here, and the server hears of it now and then. */
  const lastToldServer = useRef(0);
  const activity = () => {
    idle.touch();
    if (!liveSession || Date.now() - lastToldServer.current < KEEP_ALIVE_EVERY_MS) return;
    lastToldServer.current = Date.now();
    keepStationSessionAlive().catch(endedBy);
  };

  /**
   * A badge: refused at once when the station's copy does not know it (after one fresh copy, when
   * online: it may be newly printed); otherwise its PIN, greeting its holder by name.
   */
  const takeBadge = async (badge: string) => {
    // Nothing queued is sent while someone is at the station: a replay under way stops after its entry.
    void stopStationReplay();
    const copy = stored.current?.copy;
    if (!copy) return setStep({ kind: 'pin', badge });
    let holder = await holderOf(copy, badge);
    if (!holder && !isOffline()) {
      const fresh = await sync.takeCopy();
      if (fresh) holder = await holderOf(fresh, badge);
      // No fresh copy though the server answers: let the server decide at sign-in.
      else if (!isOffline()) return setStep({ kind: 'pin', badge });
    }
    setStep(holder ? { kind: 'pin', badge, name: holder.name } : { kind: 'badge', notice: stationSignInWords.badgeNotRecognised });
  };
  const scanAtBadge = (raw: string) => {
    const scanned = readScan(raw);
    if (scanned.kind === 'badge') void takeBadge(scanned.badge);
    else setStep({ kind: 'badge', notice: scanned.kind === 'unknown' ? NOT_A_BADGE : NO_LABEL_YET });
  };
  /** The camera's read at the badge screen: the badge of the session just ended, still held up, is not a new sign-in. */
  const cameraAtBadge = (raw: string) => {
    const scanned = readScan(raw);
    if (scanned.kind === 'badge' && justLeft.isLeftover(scanned.badge)) return;
    scanAtBadge(raw);
  };
  const nextBadge = (badge: string) => {
    done({ kind: 'badge' });
    void takeBadge(badge);
  };

  const refused = (err: unknown, badge: string, name?: string) => {
    const next = afterRefusedSignIn(err, badge, name);
    if (next === 'not-enrolled') revoked();
    else setStep(next);
  };
  /** Badge and PIN against the station's copy: the server is out of reach. */
  const signInOffline = async (copy: StoredStationCopy, badge: string, pin: string, name?: string) => {
    setChecking(true);
    try {
      const person = await signInFromCopy(copy, badge, pin);
      clearPerson({ kind: 'signed-in', who: { id: person.id, name: person.name }, idleSeconds: STATION_IDLE_SECONDS, badge, offline: true });
    } catch (err) {
      refused(err, badge, name);
    } finally {
      setChecking(false);
    }
  };
  const sendPin = async (badge: string, pin: string, name?: string) => {
    setChecking(true);
    await stopStationReplay();
    const copy = stored.current;
    if (copy && isOffline()) return signInOffline(copy, badge, pin, name);
    signIn.mutate(
      { badge, pin },
      {
        // Nothing cached before (the person who enrolled the tablet, the last one here) shows for this one.
        onSuccess: (session) => {
          setChecking(false);
          lastToldServer.current = Date.now();
          clearPerson({ kind: 'signed-in', who: session.user, idleSeconds: session.idleSeconds, badge, offline: false });
        },
        onError: (err) => {
          // The sign-in got no answer: the copy decides, as when the station knew it was offline.
          if (isNoConnection(err) && stored.current) return void signInOffline(stored.current, badge, pin, name);
          setChecking(false);
          refused(err, badge, name);
        },
      },
    );
  };

  if (offline && !sync.copy && !(signedIn && step.offline)) {
    return (
      <main className={STATION_SCREEN_CLASS}>
        <PageHeading title="The station needs a connection" tabTitle="Station" className="text-4xl" />
        <p className="mt-4 text-2xl">Check the crib's Wi-Fi. The station picks up again once Gripline answers.</p>
      </main>
    );
  }

  const busy = checking || signIn.isPending;
  return (
    <main
      className={STATION_SCREEN_CLASS}
      onPointerDown={signedIn ? activity : undefined}
      onKeyDown={signedIn ? activity : undefined}
      data-station-step={step.kind}
    >
      <div className="mx-auto flex max-w-2xl flex-col gap-6">
        <p className="text-lg text-card/80">{station.name}</p>
        {step.kind === 'badge' && (
          <>
            <PageHeading title="Scan your badge" tabTitle="Station" className="text-4xl" />
            {step.notice && <StationNotice>{step.notice}</StationNotice>}
            <StationCamera onCode={cameraAtBadge} />
            <ScanEntry label="Badge scanner" onCode={scanAtBadge} />
            <StationQueuePanel stationId={station.id} />
            <StationCopyStatus copy={sync.copy} offline={offline} />
          </>
        )}
        {step.kind === 'pin' && (
          <>
            {step.name && <p className="text-3xl font-bold">Hello, {step.name}.</p>}
            <PageHeading title="Type your PIN" tabTitle="Station" className="text-4xl" />
            {step.notice && <StationNotice>{step.notice}</StationNotice>}
            <p role="status" className={busy ? 'text-2xl' : 'sr-only'}>
              {busy ? 'Checking…' : ''}
            </p>
            <PinPad busy={busy} onPin={(pin) => void sendPin(step.badge, pin, step.name)} />
            <Button
              variant="secondary"
              className="min-h-16 text-xl!"
              onClick={() => {
                setStep({ kind: 'badge' });
                // A replay the badge stopped goes on.
                void sync.sync();
              }}
            >
              Cancel
            </Button>
          </>
        )}
        {step.kind === 'signed-in' && (
          <SignedIn
            key={step.who.id}
            who={step.who}
            badge={step.badge}
            offlineCopy={step.offline ? (sync.copy ?? undefined) : undefined}
            countdown={<IdleCountdown secondsLeft={idle.secondsLeft} />}
            onScan={activity}
            onBadge={(badge) => badge !== step.badge && nextBadge(badge)}
            onDone={() => done()}
          />
        )}
      </div>
    </main>
  );
}
