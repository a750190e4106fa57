import { useState } from 'react';
import type { CatalogueTool } from '@shared/schemas/offline';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { ReturnFields, returnBodyFrom, useReturnFieldValues } from '@/components/ui/return-fields';
import { queueFromCopy } from '../api/queue-from-copy';
import type { CopyInUse } from '../db';

/** Return from the copy: ok or needs attention (with a note), and the count for a temporary fastener tray. */
export function OfflineReturnForm({ copy, tool }: { copy: CopyInUse; tool: CatalogueTool }) {
  const [fields, setFields] = useReturnFieldValues(tool);
  const [problem, setProblem] = useState<string>();
  const [busy, setBusy] = useState(false);

  const submit = async () => {
    const made = returnBodyFrom(tool, fields);
    if ('problem' in made) return setProblem(made.problem);
    setProblem(undefined);
    setBusy(true);
    try {
      await queueFromCopy(copy, 'return', tool.code, tool.name, made.body);
    } finally {
      setBusy(false);
    }
  };

  return (
    <div className="flex flex-col gap-4">
      {problem && <Notice tone="bad">{problem}</Notice>}
      <ReturnFields name="offline-condition" tool={tool} values={fields} onChange={setFields} noteHint="A photo can be added later, with a connection." />
      <Button onClick={() => void submit()} busy={busy} className="w-full text-lg">
        Return {tool.code}
      </Button>
    </div>
  );
}
