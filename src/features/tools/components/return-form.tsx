import { useState, type ReactNode } from 'react';
import type { ToolForYou } from '@shared/schemas/tools';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { ReturnFields, returnBodyFrom, useReturnFieldValues } from '@/components/ui/return-fields';
import { messageOf } from '@/lib/errors';
import { confirmDone, type ActionDone } from '@/lib/action-done';
import { useReturnTool } from '../api/tool-actions';

export type PhotoSlot = (onUploaded: (photoId: number | undefined) => void) => ReactNode;

/**
 * Return: did it come back ok or does it need attention (with a note, and a photo if the route
 * offers one)? A temporary fastener tray asks how many came back, so a short tray is recorded.
 */
export function ReturnForm({ tool, photoSlot, onDone }: { tool: ToolForYou; photoSlot?: PhotoSlot; onDone?: ActionDone }) {
  const giveBack = useReturnTool();
  const returned = { category: tool.category, trayCapacity: tool.trayCapacity, accessoriesOut: tool.loan?.accessoriesOut ?? null };
  const [fields, setFields] = useReturnFieldValues(returned);
  const [photoId, setPhotoId] = useState<number>();
  const [problem, setProblem] = useState<string>();

  const submit = () => {
    setProblem(undefined);
    const made = returnBodyFrom(returned, fields);
    if ('problem' in made) return setProblem(made.problem);
    const body = { ...made.body, ...(photoId !== undefined && { photoId }) };
    giveBack.mutate(
      { code: tool.code, body },
      {
        onSuccess: (r) => {
          const parts = [`${tool.code} is back.`];
          if (r.shortfall) parts.push(`${r.shortfall} temporary fasteners short: noted for the quartermaster.`);
          if (r.accessoriesMissing.length > 0) parts.push(`Not back: ${r.accessoriesMissing.join(', ')}; noted for the quartermaster.`);
          if (r.offeredTo) parts.push(`It is now held for ${r.offeredTo.name}.`);
          const said = parts.join(' ');
          confirmDone(said, onDone);
        },
        onError: (err) => setProblem(messageOf(err)),
      },
    );
  };

  return (
    <div className="flex flex-col gap-4">
      {problem && <Notice tone="bad">{problem}</Notice>}
      <ReturnFields name="condition" tool={returned} values={fields} onChange={setFields} noteHint="It goes out of service until the quartermaster looks at it.">
        {photoSlot?.(setPhotoId)}
      </ReturnFields>
      <Button onClick={submit} busy={giveBack.isPending} className="w-full text-lg">
        Return {tool.code}
      </Button>
    </div>
  );
}
