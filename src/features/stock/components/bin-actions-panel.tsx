import { useState, type ComponentType } from 'react';
import type { BinAction, BinForYou } from '@shared/schemas/bins';
import { Card } from '@/components/ui/page';
import { CountForm } from './count-form';
import { DrawForm } from './draw-form';
import { MoveForm } from './move-form';
import { ReceiveForm } from './receive-form';
import { ReturnUnusedForm } from './return-unused-form';
import { WriteOffForm } from './write-off-form';
import type { ActionDone } from '@/lib/action-done';

type ActionFormProps = { bin: BinForYou; onDone?: ActionDone };

const ACTIONS: Record<BinAction, { label: string; Form: ComponentType<ActionFormProps> }> = {
  draw: { label: 'Draw', Form: DrawForm },
  return_unused: { label: 'Return unused', Form: ReturnUnusedForm },
  receive: { label: 'Receive', Form: ReceiveForm },
  count: { label: 'Count', Form: CountForm },
  move: { label: 'Move', Form: MoveForm },
  write_off: { label: 'Write off', Form: WriteOffForm },
};

/**
 * What the signed-in person may do with this bin, exactly as the server's `forYou` says. With
 * more than one action, big choice buttons pick the form; only that form is on screen.
 */
export function BinActionsPanel({ bin, onDone }: ActionFormProps) {
  const { actions } = bin.forYou;
  const [picked, setPicked] = useState<BinAction>();
  // The server may withdraw an action (the bin ran empty): fall back to the first still offered.
  const chosen = picked && actions.includes(picked) ? picked : actions[0];
  const Form = chosen && ACTIONS[chosen].Form;

  return (
    <Card title="What you can do">
      {actions.length === 0 && (
        <p className="text-steel">{bin.onHand === 0 ? `${bin.code} is empty. Tell the quartermaster if you need some.` : 'Nothing to do with this bin right now.'}</p>
      )}
      {actions.length > 1 && (
        <fieldset className="mb-4">
          <legend className="mb-2 text-sm font-semibold">Choose what to do</legend>
          <div className="grid grid-cols-2 gap-2 sm:grid-cols-3">
            {actions.map((a) => (
              <label
                key={a}
                className="relative flex min-h-12 cursor-pointer items-center justify-center rounded-lg border-2 border-ink bg-card px-3 text-center font-semibold has-checked:bg-ink has-checked:text-card has-focus-visible:outline-3 has-focus-visible:outline-brass"
              >
                <input
                  type="radio"
                  name="bin-action"
                  value={a}
                  checked={chosen === a}
                  onChange={() => setPicked(a)}
                  // Covers the whole choice, invisible: a tap anywhere on it picks it, and the text stays the label.
                  className="absolute inset-0 m-0 cursor-pointer appearance-none rounded-lg outline-none"
                />
                {ACTIONS[a].label}
              </label>
            ))}
          </div>
        </fieldset>
      )}
      {actions.length === 1 && chosen && <h3 className="mb-3 font-semibold">{ACTIONS[chosen].label}</h3>}
      {Form && <Form key={chosen} bin={bin} onDone={onDone} />}
    </Card>
  );
}
