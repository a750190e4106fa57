import { useState, type ReactNode } from 'react';
import { toast } from 'sonner';
import type { ToolForYou } from '@shared/schemas/tools';
import { Button } from '@/components/ui/button';
import { ConditionField, type ReturnCondition } from '@/components/ui/condition-field';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { messageOf } from '@/lib/errors';
import { useReturnTool } from '../api/tool-actions';

export type PhotoSlot = (onUploaded: (photoId: number | undefined) => void) => ReactNode;

/**
 * Return: did it come back ok or does it need attention (with a note, and a photo if the route
 * offers one)? A temporary fastener tray asks how many came back, so a short tray is recorded.
 */
export function ReturnForm({ tool, photoSlot, onDone }: { tool: ToolForYou; photoSlot?: PhotoSlot; onDone?: () => void }) {
  const giveBack = useReturnTool();
  const isTray = tool.category === 'temporary_fastener_tray';
  const [condition, setCondition] = useState<ReturnCondition>('ok');
  const [note, setNote] = useState('');
  const [count, setCount] = useState(isTray && tool.trayCapacity ? String(tool.trayCapacity) : '');
  const [photoId, setPhotoId] = useState<number>();
  const [problem, setProblem] = useState<string>();

  const submit = () => {
    setProblem(undefined);
    const body = {
      condition,
      ...(note.trim() && { note: note.trim() }),
      ...(isTray && { returnedCount: Number(count) }),
      ...(photoId !== undefined && { photoId }),
    };
    giveBack.mutate(
      { code: tool.code, body },
      {
        onSuccess: (r) => {
          const parts = [`${tool.code} is back.`];
          if (r.shortfall) parts.push(`${r.shortfall} temporary fasteners short: noted for the quartermaster.`);
          if (r.offeredTo) parts.push(`It is now held for ${r.offeredTo.name}.`);
          toast.success(parts.join(' '));
          onDone?.();
        },
        onError: (err) => setProblem(messageOf(err)),
      },
    );
  };

  return (
    <div className="flex flex-col gap-4">
      {problem && <Notice tone="bad">{problem}</Notice>}
      <ConditionField name="condition" value={condition} onChange={setCondition} />
      {isTray && (
        <TextField
          label="Temporary fasteners in the tray now"
          type="number"
          inputMode="numeric"
          min={0}
          max={tool.trayCapacity ?? undefined}
          value={count}
          onChange={(e) => setCount(e.target.value)}
          hint={`A full tray holds ${tool.trayCapacity}.`}
        />
      )}
      {condition === 'needs_attention' && (
        <>
          <TextField label="What needs attention?" value={note} onChange={(e) => setNote(e.target.value)} hint="It goes out of service until the quartermaster looks at it." />
          {photoSlot?.(setPhotoId)}
        </>
      )}
      <Button onClick={submit} busy={giveBack.isPending} className="w-full text-lg">
        Return {tool.code}
      </Button>
    </div>
  );
}
