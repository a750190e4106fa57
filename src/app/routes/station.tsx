import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useRef, useState, type ReactNode } from 'react';
import { Link } from 'react-router';
import { toast } from 'sonner';
import { STATION_IDLE_SECONDS } from '@shared/schemas/stations';
import { useOffline } from '@/features/offline/connection';
import { forgetStation, readKeptStation, type KeptStation } from '@/features/stations/api/kept-station';
import { endStationSession, endsStationSession, KEEP_ALIVE_EVERY_MS, keepStationSessionAlive, useStationSignIn } from '@/features/stations/api/station-session';
import { ScanEntry } from '@/features/stations/components/scan-entry';
import { IdleCountdown } from '@/features/stations/components/idle-countdown';
import { PinPad } from '@/features/stations/components/pin-pad';
import { afterRefusedSignIn, NO_LABEL_YET, type StationStep } from '@/features/stations/hooks/station-steps';
import { useIdleCountdown } from '@/features/stations/hooks/use-idle-countdown';
import { binQueryOptions } from '@/features/stock/api/get-bins';
import { BinActionsPanel } from '@/features/stock/components/bin-actions-panel';
import { toolQueryOptions } from '@/features/tools/api/get-tool';
import { CameraScanner } from '@/features/tools/components/camera-scanner';
import { ToolActionsPanel } from '@/features/tools/components/tool-actions-panel';
import { labelPath } from '@/features/tools/utils/label-path';
import { Button } from '@/components/ui/button';
import { PageHeading } from '@/components/ui/page';
import { setStationToken } from '@/lib/api-client';
import { messageOf } from '@/lib/errors';

/** A scanned code: a tool or bin label opens it; anything else is taken for a badge. */
type Scanned = { kind: 'tool' | 'bin'; code: string } | { kind: 'badge'; badge: string };

function readScan(raw: string): Scanned {
  const path = labelPath(raw);
  if (!path) return { kind: 'badge', badge: raw.trim() };
  const code = raw.trim().toUpperCase();
  return { kind: path.startsWith('/tools/') ? 'tool' : 'bin', code };
}

const screenClass = 'min-h-dvh bg-ink px-4 py-6 text-card sm:px-8';

/**
 * The full-screen crib station, outside the signed-in app: badge, PIN, then tools and bins for
 * that person until Done, a minute without a scan or tap, or the next badge.
 */
export function StationRoute() {
  const [station, setStation] = useState<KeptStation | undefined>(readKeptStation);
  useEffect(() => {
    setStationToken(station?.token);
    return () => setStationToken(undefined);
  }, [station]);

  if (!station) {
    return (
      <main className={screenClass}>
        <div className="mx-auto flex max-w-xl flex-col gap-4">
          <PageHeading title="This device is not a station" tabTitle="Station" className="text-4xl" />
          <p className="text-xl">A quartermaster makes a device a station on the Stations page.</p>
          <Link to="/sign-in?next=%2Fstations" className="inline-flex min-h-12 items-center self-start text-xl font-semibold text-brass underline underline-offset-4">
            Sign in
          </Link>
        </div>
      </main>
    );
  }
  return (
    <StationScreen
      station={station}
      onRevoked={() => {
        forgetStation();
        setStation(undefined);
      }}
    />
  );
}

function StationScreen({ station, onRevoked }: { station: KeptStation; onRevoked: () => void }) {
  const queryClient = useQueryClient();
  const offline = useOffline();
  const signIn = useStationSignIn();
  const [step, setStep] = useState<StationStep>({ kind: 'badge' });
  const signedIn = step.kind === 'signed-in';

  /** Back to "Scan your badge" with nothing of the last person left: no cached answers, no toasts. */
  const clearPerson = useCallback(
    (next: StationStep) => {
      setStep(next);
      toast.dismiss();
      queryClient.clear();
    },
    [queryClient],
  );
  const done = useCallback(
    (next: StationStep = { kind: 'badge' }) => {
      clearPerson(next);
      void endStationSession();
    },
    [clearPerson],
  );

  const idle = useIdleCountdown(signedIn, signedIn ? step.session.idleSeconds : STATION_IDLE_SECONDS, () =>
    done({ kind: 'badge', notice: 'Signed out after a minute without a scan or tap.' }),
  );

  /** An answer saying the session is over (idle on the server, station revoked) ends it here too. */
  const endedBy = useCallback(
    (err: unknown) => {
      const ended = endsStationSession(err);
      if (ended === 'not-enrolled') onRevoked();
      else if (ended === 'ended') clearPerson({ kind: 'badge', notice: 'The station signed you out. Scan your badge to go on.' });
    },
    [onRevoked, clearPerson],
  );
  useEffect(() => {
    if (!signedIn) return;
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
  }, [signedIn, queryClient, endedBy]);

  /** A scan or tap: the minute starts over here, and the server hears of it now and then. */
  const lastToldServer = useRef(0);
  const activity = () => {
    idle.touch();
    if (Date.now() - lastToldServer.current < KEEP_ALIVE_EVERY_MS) return;
    lastToldServer.current = Date.now();
    keepStationSessionAlive().catch(endedBy);
  };

  const takeBadge = (badge: string) => setStep({ kind: 'pin', badge });

  const sendPin = (badge: string, pin: string) =>
    signIn.mutate(
      { badge, pin },
      {
        // Nothing cached before (the person who enrolled the tablet, the last one here) shows for this one.
        onSuccess: (session) => {
          lastToldServer.current = Date.now();
          clearPerson({ kind: 'signed-in', session, badge });
        },
        onError: (err) => {
          const next = afterRefusedSignIn(err, badge);
          if (next === 'not-enrolled') onRevoked();
          else setStep(next);
        },
      },
    );

  if (offline) {
    return (
      <main className={screenClass}>
        <PageHeading title="The station needs a connection" tabTitle="Station" className="text-4xl" />
        <p className="mt-4 text-2xl">Check the crib's Wi-Fi. The station picks up again once Gripline answers.</p>
      </main>
    );
  }

  return (
    <main
      className={screenClass}
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
            <StationCamera
              onCode={(raw) => {
                const scanned = readScan(raw);
                if (scanned.kind === 'badge') takeBadge(scanned.badge);
                else setStep({ kind: 'badge', notice: NO_LABEL_YET });
              }}
            />
            <ScanEntry label="Badge scanner" onCode={takeBadge} />
          </>
        )}
        {step.kind === 'pin' && (
          <>
            <PageHeading title="Type your PIN" tabTitle="Station" className="text-4xl" />
            {step.notice && <StationNotice>{step.notice}</StationNotice>}
            <PinPad busy={signIn.isPending} onPin={(pin) => sendPin(step.badge, pin)} />
            <Button variant="secondary" className="min-h-16 text-xl!" onClick={() => setStep({ kind: 'badge' })}>
              Cancel
            </Button>
          </>
        )}
        {step.kind === 'signed-in' && (
          <SignedIn
            key={step.session.user.id}
            name={step.session.user.name}
            countdown={<IdleCountdown secondsLeft={idle.secondsLeft} />}
            onScan={activity}
            onBadge={(badge) => badge !== step.badge && done({ kind: 'pin', badge })}
            onDone={() => done()}
          />
        )}
      </div>
    </main>
  );
}

/** The tools' camera, its notices in their own dark text on the station's dark screen. */
function StationCamera({ onCode }: { onCode: (code: string) => void }) {
  return (
    <div className="text-ink">
      <CameraScanner onCode={onCode} />
    </div>
  );
}

function StationNotice({ children }: { children: string }) {
  return (
    <p role="alert" className="rounded-lg border-l-8 border-brass bg-card px-4 py-3 text-xl font-semibold text-ink">
      {children}
    </p>
  );
}

interface SignedInProps {
  name: string;
  countdown: ReactNode;
  onScan: () => void;
  onBadge: (badge: string) => void;
  onDone: () => void;
}

/** One person at the station: scan a tool or bin, do what they may, and see what happened in large type. */
function SignedIn({ name, countdown, onScan, onBadge, onDone }: SignedInProps) {
  const [item, setItem] = useState<{ kind: 'tool' | 'bin'; code: string }>();
  const [result, setResult] = useState<string>();
  const scan = (raw: string) => {
    onScan();
    const scanned = readScan(raw);
    if (scanned.kind === 'badge') return onBadge(scanned.badge);
    setResult(undefined);
    setItem(scanned);
  };
  const finished = (code: string) => {
    setItem(undefined);
    setResult(`Done: ${code}. Scan the next tool or bin, or tap Done.`);
  };

  return (
    <>
      <div className="flex flex-wrap items-center justify-between gap-4">
        <PageHeading title={`Hello, ${name}`} tabTitle="Station" className="text-4xl" />
        <Button variant="secondary" className="min-h-16 px-10 text-2xl!" onClick={onDone}>
          Done
        </Button>
      </div>
      {countdown}
      {result && (
        <p role="status" className="rounded-lg bg-card px-4 py-4 text-3xl font-bold text-ink">
          {result}
        </p>
      )}
      {item ? (
        <div className="flex flex-col gap-3 text-ink">
          {item.kind === 'tool' ? <StationTool code={item.code} onDone={() => finished(item.code)} /> : <StationBin code={item.code} onDone={() => finished(item.code)} />}
          <Button variant="secondary" className="min-h-16 text-xl!" onClick={() => setItem(undefined)}>
            Scan a tool or bin
          </Button>
        </div>
      ) : (
        <>
          <h2 className="text-3xl font-bold">Scan a tool or bin</h2>
          <StationCamera onCode={scan} />
          <ScanEntry label="Scanner, or type a tool or bin code" onCode={scan} />
        </>
      )}
    </>
  );
}

function StationTool({ code, onDone }: { code: string; onDone: () => void }) {
  const tool = useQuery(toolQueryOptions(code));
  if (tool.isPending) return <p className="text-2xl text-card">Opening {code}…</p>;
  if (tool.isError) return <StationNotice>{messageOf(tool.error)}</StationNotice>;
  return (
    <>
      <h2 className="text-3xl font-bold text-card">
        {tool.data.code} · {tool.data.name}
      </h2>
      <ToolActionsPanel tool={tool.data} onDone={onDone} />
    </>
  );
}

/** Only draw and return unused at the station; the rest is a quartermaster's job at their own device. */
const STATION_BIN_ACTIONS = new Set(['draw', 'return_unused']);

function StationBin({ code, onDone }: { code: string; onDone: () => void }) {
  const bin = useQuery(binQueryOptions(code));
  if (bin.isPending) return <p className="text-2xl text-card">Opening {code}…</p>;
  if (bin.isError) return <StationNotice>{messageOf(bin.error)}</StationNotice>;
  const atStation = { ...bin.data, forYou: { ...bin.data.forYou, actions: bin.data.forYou.actions.filter((a) => STATION_BIN_ACTIONS.has(a)) } };
  return (
    <>
      <h2 className="text-3xl font-bold text-card">
        {bin.data.code} · {bin.data.name}
      </h2>
      <BinActionsPanel bin={atStation} onDone={onDone} />
    </>
  );
}
