import { useQuery } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { useNavigate } from 'react-router';
import { TOOL_CODE_PATTERN } from '@shared/schemas/tools';
import { BIN_CODE_PATTERN } from '@shared/stock/kinds';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { OfflineCopyStatus } from '@/features/offline/components/offline-copy-status';
import { CameraScanner } from '@/features/tools/components/camera-scanner';
import { CodeEntry } from '@/features/tools/components/code-entry';
import { Notice } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page';

/** Where a scanned label leads: a tool code opens the tool, a bin code the bin; anything else is not ours. */
export function labelPath(raw: string): string | undefined {
  const code = raw.trim().toUpperCase();
  if (TOOL_CODE_PATTERN.test(code)) return `/tools/${code}`;
  if (BIN_CODE_PATTERN.test(code)) return `/bins/${code}`;
  return undefined;
}

/** Scan a label with the camera, a USB scanner or by typing: it opens that tool or bin. */
export function ScanRoute() {
  const navigate = useNavigate();
  // Ready to scan once the code entry is on screen: a USB scanner or typing works from here while
  // the camera starts. `npm run bench:load` times the first load up to this mark.
  useEffect(() => {
    performance.mark('scan-ready');
  }, []);
  const me = useQuery(meQueryOptions()).data;
  const [problem, setProblem] = useState<string>();
  const open = (raw: string) => {
    const path = labelPath(raw);
    if (path) {
      setProblem(undefined);
      void navigate(path);
    } else {
      setProblem(`"${raw.slice(0, 40)}" is not a Gripline label. Tool codes look like T-0042, bin codes like B-0107.`);
    }
  };
  // The code field mounts with the page, so the page can take a code from its first paint.
  return (
    <div data-scan-ready="true">
      <PageHeader title="Scan" lead="Hold a tool or bin label inside the frame. A USB scanner works too." />
      <div className="mx-auto flex max-w-lg flex-col gap-4">
        {problem && <Notice tone="warn">{problem}</Notice>}
        <CameraScanner onCode={open} />
        <CodeEntry onCode={open} autoFocus />
        {me && <OfflineCopyStatus memberId={me.id} />}
      </div>
    </div>
  );
}
