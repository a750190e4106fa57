import type { FormEventHandler, ReactNode } from 'react';
import { Controller, type Control, type FieldPath, type FieldValues } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { QuantityField } from '@/components/ui/quantity-field';

/** The frame every bin action shares: the server's refusal on top, the fields, one big confirm button. */
export function ActionForm({
  label,
  onSubmit,
  problem,
  submitLabel,
  busy,
  children,
}: {
  label: string;
  onSubmit: FormEventHandler<HTMLFormElement>;
  problem?: string;
  submitLabel: string;
  busy: boolean;
  children: ReactNode;
}) {
  return (
    <form aria-label={label} onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      {problem && <Notice tone="bad">{problem}</Notice>}
      {children}
      <Button type="submit" busy={busy} className="w-full text-lg">
        {submitLabel}
      </Button>
    </form>
  );
}

/** A QuantityField bound to a react-hook-form number field. */
export function QuantityInput<T extends FieldValues, O>({
  control,
  name,
  label,
  hint,
  max,
  step,
  min = 1,
}: {
  control: Control<T, unknown, O>;
  name: FieldPath<T>;
  label: string;
  hint?: ReactNode;
  max?: number;
  step?: number;
  min?: number;
}) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <QuantityField
          label={label}
          name={field.name}
          value={field.value}
          onChange={field.onChange}
          onBlur={field.onBlur}
          min={min}
          max={max}
          step={step}
          hint={hint}
          error={fieldState.error?.message}
        />
      )}
    />
  );
}

/** What the entry will do, said before it is saved; read out when it changes. */
export function Preview({ children }: { children: ReactNode }) {
  return (
    <p aria-live="polite" className="rounded-lg border border-rule bg-paper px-3 py-2 text-base">
      {children}
    </p>
  );
}
