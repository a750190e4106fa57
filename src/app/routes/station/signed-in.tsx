import { useQuery } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import type { StoredStationCopy } from '@/features/offline/db';
import { StationOfflineItem } from '@/features/offline/components/station-offline-item';
import { NOT_OURS } from '@/features/stations/hooks/station-steps';
import { binQueryOptions } from '@/features/stock/api/get-bins';
import { BinActionsPanel } from '@/features/stock/components/bin-actions-panel';
import { toolQueryOptions } from '@/features/tools/api/get-tool';
import { CameraScanner } from '@/features/tools/components/camera-scanner';
import { ToolActionsPanel } from '@/features/tools/components/tool-actions-panel';
import { ScanEntry } from '@/features/stations/components/scan-entry';
import { Button } from '@/components/ui/button';
import { PageHeading } from '@/components/ui/page';
import { messageOf } from '@/lib/errors';
import { useJustLeft } from './just-left';
import { readScan } from './read-scan';

/** The tools' camera, its notices in their own dark text on the station's dark screen. */
export function StationCamera({ onCode }: { onCode: (code: string) => void }) {
  return (
    <div className="text-ink">
      <CameraScanner onCode={onCode} />
    </div>
  );
}

export function StationNotice({ children, role = 'alert' }: { children: string; role?: 'alert' | 'status' }) {
  return (
    <p role={role} className="rounded-lg border-l-8 border-brass bg-card px-4 py-3 text-xl font-semibold text-ink">
      {children}
    </p>
  );
}

interface SignedInProps {
  who: { id: number; name: string };
  badge: string;
  /** Set when signed in against the station's copy: scans open the offline views and actions are queued. */
  offlineCopy?: StoredStationCopy;
  countdown: ReactNode;
  onScan: () => void;
  onBadge: (badge: string) => void;
  onDone: () => void;
}

/** One person at the station: scan a tool or bin, do what they may, and see what happened in large type. */
export function SignedIn({ who, badge, offlineCopy, countdown, onScan, onBadge, onDone }: SignedInProps) {
  const [item, setItem] = useState<{ kind: 'tool' | 'bin'; code: string }>();
  const [result, setResult] = useState<string>();
  const justLeft = useJustLeft();
  const scan = (raw: string) => {
    onScan();
    const scanned = readScan(raw);
    if (scanned.kind === 'badge') return onBadge(scanned.badge);
    if (scanned.kind === 'unknown') return setResult(NOT_OURS);
    setResult(undefined);
    setItem(scanned);
  };
  const scanByCamera = (raw: string) => {
    const scanned = readScan(raw);
    if ('code' in scanned && justLeft.isLeftover(scanned.code)) return;
    scan(raw);
  };
  /** Back to the scan list, the label of the item just left perhaps still in front of the camera. */
  const leaveItem = (code: string) => {
    justLeft.mark(code);
    setItem(undefined);
  };
  /** What was done, in the words that confirmed it (the due date, the tab), large enough to read from a step away. */
  const backToScan = (code: string, words: string) => {
    leaveItem(code);
    setResult(`${words} Scan the next tool or bin, or tap Done.`);
  };
  const queued = (code: string) => backToScan(code, `Waiting to send: ${code}. It goes when the connection is back.`);

  return (
    <>
      <div className="flex flex-wrap items-center justify-between gap-4">
        <PageHeading title={`Hello, ${who.name}`} tabTitle="Station" className="text-4xl" />
        <Button variant="secondary" className="min-h-16 px-10 text-2xl!" onClick={onDone}>
          Done
        </Button>
      </div>
      {offlineCopy && <StationNotice role="status">No connection: what you do here is sent when it is back.</StationNotice>}
      {countdown}
      {result && (
        <p role="status" className="rounded-lg bg-card px-4 py-4 text-3xl font-bold text-ink">
          {result}
        </p>
      )}
      {item ? (
        <div className="flex flex-col gap-3 text-ink">
          {offlineCopy ? (
            <StationOfflineItem stored={offlineCopy} person={who} badge={badge} item={item} onQueued={() => queued(item.code)} />
          ) : item.kind === 'tool' ? (
            <StationTool code={item.code} onDone={(said) => backToScan(item.code, said)} />
          ) : (
            <StationBin code={item.code} onDone={(said) => backToScan(item.code, said)} />
          )}
          <Button variant="secondary" className="min-h-16 text-xl!" onClick={() => leaveItem(item.code)}>
            Scan a tool or bin
          </Button>
        </div>
      ) : (
        <>
          <h2 className="text-3xl font-bold">Scan a tool or bin</h2>
          <StationCamera onCode={scanByCamera} />
          <ScanEntry label="Scanner, or type a tool or bin code" onCode={scan} />
        </>
      )}
    </>
  );
}

function StationTool({ code, onDone }: { code: string; onDone: (said: string) => void }) {
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

function StationBin({ code, onDone }: { code: string; onDone: (said: string) => void }) {
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
