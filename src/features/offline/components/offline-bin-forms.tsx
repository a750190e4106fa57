import { useState } from 'react';
import { drawBodySchema, returnUnusedBodySchema } from '@shared/schemas/bins';
import type { QueuedActionKind } from '@shared/schemas/offline';
import { Button } from '@/components/ui/button';
import { SelectField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { QuantityField } from '@/components/ui/quantity-field';
import { formatAssembly, formatQuantity } from '@/lib/format';
import { queueFromCopy } from '../api/queue-from-copy';
import type { CopyInUse } from '../db';
import type { OfflineBin } from '../utils/offline-state';

/**
 * Draw (optionally for one of the member's assemblies) or return unused, from the copy. The most
 * allowed is what the copy and the member's waiting actions leave; the server checks again on replay.
 */
export function OfflineBinForm({ copy, state, kind }: { copy: CopyInUse; state: OfflineBin; kind: Extract<QueuedActionKind, 'draw' | 'return_unused'> }) {
  const { bin } = state;
  const isDraw = kind === 'draw';
  const most = isDraw ? state.onHand : state.drawnByYou;
  const [quantity, setQuantity] = useState<number>();
  const [assemblyId, setAssemblyId] = useState('');
  const [problem, setProblem] = useState<string>();
  const [busy, setBusy] = useState(false);
  const assemblies = copy.catalogue.yourAssemblies;

  const submit = async () => {
    const schema = isDraw ? drawBodySchema : returnUnusedBodySchema;
    const parsed = schema.safeParse({ quantity, ...(isDraw && assemblyId && { assemblyId: Number(assemblyId) }) });
    if (!parsed.success) return setProblem(parsed.error.issues[0]?.message);
    if (parsed.data.quantity > most) {
      return setProblem(
        isDraw
          ? `The copy shows ${formatQuantity(most, bin.unit)} in ${bin.code}. Draw fewer or ask the quartermaster.`
          : `You can return at most ${formatQuantity(most, bin.unit)}: what you drew from ${bin.code} and kept.`,
      );
    }
    setProblem(undefined);
    setBusy(true);
    try {
      await queueFromCopy(copy, kind, bin.code, bin.designation, parsed.data);
      setQuantity(undefined);
    } finally {
      setBusy(false);
    }
  };

  return (
    <form
      aria-label={isDraw ? 'Draw' : 'Return unused'}
      noValidate
      className="flex flex-col gap-4"
      onSubmit={(e) => {
        e.preventDefault();
        void submit();
      }}
    >
      {problem && <Notice tone="bad">{problem}</Notice>}
      <QuantityField
        label={isDraw ? 'Quantity to draw' : 'Quantity to return'}
        value={quantity}
        onChange={setQuantity}
        min={1}
        max={most}
        hint={isDraw ? `${formatQuantity(most, bin.unit)} on hand by the copy.` : `You drew ${formatQuantity(most, bin.unit)} and have not returned them.`}
      />
      {isDraw && assemblies.length > 0 && (
        <SelectField
          label="For which assembly (optional)"
          value={assemblyId}
          onChange={(e) => setAssemblyId(e.target.value)}
          options={[{ value: '', label: 'Not for an assembly' }, ...assemblies.map((a) => ({ value: String(a.id), label: formatAssembly(a) }))]}
        />
      )}
      <Button type="submit" busy={busy} className="w-full text-lg">
        {isDraw ? `Draw from ${bin.code}` : `Return to ${bin.code}`}
      </Button>
    </form>
  );
}
