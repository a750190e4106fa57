import { useState } from 'react';
import type { Tool } from '@shared/schemas/tools';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { messageOf } from '@/lib/errors';
import { formatDate } from '@/lib/format';
import { useResolveAccessory } from '../api/tool-actions';

/**
 * Accessories that did not come back with a loan: who had it and when it came back without them.
 * The quartermaster marks each found or replaced, which takes it off this list and the Service list.
 */
export function MissingAccessories({ tool, canResolve, onResolved }: { tool: Tool; canResolve: boolean; onResolved?: () => void }) {
  const resolve = useResolveAccessory();
  const [problem, setProblem] = useState<string>();
  if (tool.missingAccessories.length === 0) return null;
  const mark = (accessory: string, resolution: 'found' | 'replaced') => {
    setProblem(undefined);
    resolve.mutate({ code: tool.code, body: { accessory, resolution } }, { onSuccess: () => onResolved?.(), onError: (err) => setProblem(messageOf(err)) });
  };
  return (
    <section aria-labelledby="missing-accessories" className="flex flex-col gap-2">
      <h2 id="missing-accessories" className="font-semibold">
        Missing accessories
      </h2>
      {problem && <Notice tone="bad">{problem}</Notice>}
      <ul className="flex flex-col gap-2">
        {tool.missingAccessories.map((m) => (
          <li key={m.accessory} className="rounded-lg border border-rule bg-card p-3">
            <p>
              <strong>{m.accessory}</strong> did not come back from {m.lastHolder.name} on {formatDate(m.reportedAt)}.
            </p>
            {canResolve && (
              <div className="mt-2 flex flex-wrap gap-2">
                <Button variant="secondary" busy={resolve.isPending} onClick={() => mark(m.accessory, 'found')} aria-label={`${m.accessory} found`}>
                  Found
                </Button>
                <Button variant="secondary" busy={resolve.isPending} onClick={() => mark(m.accessory, 'replaced')} aria-label={`${m.accessory} replaced`}>
                  Replaced
                </Button>
              </div>
            )}
          </li>
        ))}
      </ul>
    </section>
  );
}
