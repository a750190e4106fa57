export type ReturnCondition = 'ok' | 'needs_attention';

/** "How is it?" on a tool's return: works fine, or needs attention. */
export function ConditionField({ name, value, onChange }: { name: string; value: ReturnCondition; onChange: (value: ReturnCondition) => void }) {
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="text-sm font-semibold">How is it?</legend>
      <label className="flex min-h-12 items-center gap-3">
        <input type="radio" name={name} className="size-6 accent-ink" checked={value === 'ok'} onChange={() => onChange('ok')} />
        Works fine
      </label>
      <label className="flex min-h-12 items-center gap-3">
        <input type="radio" name={name} className="size-6 accent-ink" checked={value === 'needs_attention'} onChange={() => onChange('needs_attention')} />
        Needs attention
      </label>
    </fieldset>
  );
}
