import { useQuery } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { useNavigate } from 'react-router';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { OfflineCopyStatus } from '@/features/offline/components/offline-copy-status';
import { CameraScanner } from '@/features/tools/components/camera-scanner';
import { CodeEntry } from '@/features/tools/components/code-entry';
import { labelPath, notALabelWords } from '@/features/tools/utils/label-path';
import { Notice } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page';

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
      setProblem(notALabelWords(raw));
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
