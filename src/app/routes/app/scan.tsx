import { useState } from 'react';
import { useNavigate } from 'react-router';
import { TOOL_CODE_PATTERN } from '@shared/schemas/tools';
import { CameraScanner } from '@/features/tools/components/camera-scanner';
import { CodeEntry } from '@/features/tools/components/code-entry';
import { Notice } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page';

/** Scan a label with the camera, a USB scanner or by typing: a tool code opens that tool. */
export function ScanRoute() {
  const navigate = useNavigate();
  const [problem, setProblem] = useState<string>();
  const open = (raw: string) => {
    const code = raw.trim().toUpperCase();
    if (TOOL_CODE_PATTERN.test(code)) {
      setProblem(undefined);
      void navigate(`/tools/${code}`);
    } else {
      setProblem(`"${raw.slice(0, 40)}" is not a Gripline label. Tool codes look like T-0042.`);
    }
  };
  return (
    <>
      <PageHeader title="Scan" lead="Hold the label inside the frame. A USB scanner works too." />
      <div className="mx-auto flex max-w-lg flex-col gap-4">
        {problem && <Notice tone="warn">{problem}</Notice>}
        <CameraScanner onCode={open} />
        <CodeEntry onCode={open} autoFocus />
      </div>
    </>
  );
}
