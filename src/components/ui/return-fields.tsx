import { useState, type ReactNode } from 'react';
import { ConditionField, type ReturnCondition } from '@/components/ui/condition-field';
import { TextField } from '@/components/ui/field';

/** What a return form needs to know of the tool coming back. */
export interface ReturnedTool {
  category: string;
  trayCapacity: number | null;
}

/** The return fields as typed: the tray count stays a string until the form sends it. */
export interface ReturnFieldValues {
  condition: ReturnCondition;
  note: string;
  count: string;
}

export const isTray = (tool: ReturnedTool): boolean => tool.category === 'temporary_fastener_tray';

/** Fresh return fields: works fine, no note, and a tray assumed full until counted. */
export function useReturnFieldValues(tool: ReturnedTool) {
  return useState<ReturnFieldValues>(() => ({
    condition: 'ok',
    note: '',
    count: isTray(tool) && tool.trayCapacity ? String(tool.trayCapacity) : '',
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
      {values.condition === 'needs_attention' && (
        <>
          <TextField label="What needs attention?" value={values.note} onChange={(e) => onChange({ ...values, note: e.target.value })} hint={noteHint} />
          {children}
        </>
      )}
    </>
  );
}
