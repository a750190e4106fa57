import { useState, type ReactNode } from 'react';
import { AccessoryChecklist } from '@/components/ui/accessory-checklist';
import { ConditionField, type ReturnCondition } from '@/components/ui/condition-field';
import { TextField } from '@/components/ui/field';
import { returnBodySchema, type ReturnBody } from '@shared/schemas/tools';

/** What a return form needs to know of the tool coming back. */
export interface ReturnedTool {
  category: string;
  trayCapacity: number | null;
  /** What went out with the loan, to tick back (null or empty: nothing to tick). */
  accessoriesOut: string[] | null;
}

/** The return fields as typed: the tray count stays a string until the form sends it. */
export interface ReturnFieldValues {
  condition: ReturnCondition;
  note: string;
  count: string;
  /** The accessories ticked as back. */
  back: string[];
}

export const isTray = (tool: ReturnedTool): boolean => tool.category === 'temporary_fastener_tray';

/**
 * The return's body from the fields, or the sentence that says what to fix. A tray with its count
 * cleared is asked for a count, never sent as 0 (which would record every fastener as lost).
 */
export function returnBodyFrom(tool: ReturnedTool, { condition, note, count, back }: ReturnFieldValues): { body: ReturnBody } | { problem: string } {
  const tray = isTray(tool);
  if (tray && count.trim() === '') return { problem: 'Count the temporary fasteners that came back.' };
  const parsed = returnBodySchema.safeParse({
    condition,
    ...(note.trim() && { note: note.trim() }),
    ...(tray && { returnedCount: Number(count) }),
    ...((tool.accessoriesOut?.length ?? 0) > 0 && { accessoriesBack: back }),
  });
  if (!parsed.success) return { problem: parsed.error.issues[0]?.message ?? 'Check the return.' };
  const counted = parsed.data.returnedCount;
  if (tray && tool.trayCapacity !== null && counted !== undefined && counted > tool.trayCapacity) {
    return { problem: `A full tray holds ${tool.trayCapacity}. Count again.` };
  }
  return { body: parsed.data };
}

/** Fresh return fields: works fine, no note, and a tray assumed full until counted. */
export function useReturnFieldValues(tool: ReturnedTool) {
  return useState<ReturnFieldValues>(() => ({
    condition: 'ok',
    note: '',
    count: isTray(tool) && tool.trayCapacity ? String(tool.trayCapacity) : '',
    back: [],
  }));
}

/**
 * How it came back, how many temporary fasteners are in a tray, and what needs attention.
 * `children` follow the note (a photo, where the page offers one).
 */
export function ReturnFields({
  name,
  tool,
  values,
  onChange,
  noteHint,
  children,
}: {
  name: string;
  tool: ReturnedTool;
  values: ReturnFieldValues;
  onChange: (values: ReturnFieldValues) => void;
  noteHint: string;
  children?: ReactNode;
}) {
  return (
    <>
      <ConditionField name={name} value={values.condition} onChange={(condition) => onChange({ ...values, condition })} />
      {isTray(tool) && (
        <TextField
          label="Temporary fasteners in the tray now"
          type="number"
          inputMode="numeric"
          min={0}
          max={tool.trayCapacity ?? undefined}
          value={values.count}
          onChange={(e) => onChange({ ...values, count: e.target.value })}
          hint={`A full tray holds ${tool.trayCapacity}.`}
        />
      )}
      {tool.accessoriesOut && tool.accessoriesOut.length > 0 && (
        <AccessoryChecklist legend="Tick what came back with it" items={tool.accessoriesOut} ticked={values.back} onChange={(back) => onChange({ ...values, back })}>
          <p className="text-sm text-steel">Anything not ticked is recorded as missing, for the quartermaster.</p>
        </AccessoryChecklist>
      )}
      {values.condition === 'needs_attention' && (
        <>
          <TextField label="What needs attention?" value={values.note} onChange={(e) => onChange({ ...values, note: e.target.value })} hint={noteHint} />
          {children}
        </>
      )}
    </>
  );
}
