import { useFieldArray, useFormContext } from 'react-hook-form';
import { TextField } from '@/components/ui/field';
import { errorAt, type AssemblyFormValues } from '../utils/form-values';

/** Anything else the assembly takes from a bin: 24 screws from B-0210. */
export function ExtraItemsFields() {
  const { control, register, formState } = useFormContext<AssemblyFormValues>();
  const { fields, append, remove } = useFieldArray({ control, name: 'extraItems' });
  return (
    <section aria-labelledby="extra-items-heading" className="flex flex-col gap-3">
      <h2 id="extra-items-heading" className="text-lg font-semibold">
        Extra items
      </h2>
      <p className="text-sm text-steel">Screws, nuts, sealant: anything the assembly draws from a bin besides its rivet lines.</p>
      {fields.map((field, i) => (
        <fieldset key={field.id} className="grid items-end gap-3 rounded-xl border border-rule bg-card p-4 sm:grid-cols-[1fr_1fr_auto]">
          <legend className="sr-only">Extra item {i + 1}</legend>
          <TextField label="Bin code" placeholder="B-0210" autoCapitalize="characters" autoComplete="off" error={errorAt(formState.errors, `extraItems.${i}.binCode`)} {...register(`extraItems.${i}.binCode`)} />
          <TextField label="Quantity" inputMode="numeric" autoComplete="off" error={errorAt(formState.errors, `extraItems.${i}.quantity`)} {...register(`extraItems.${i}.quantity`)} />
          <button type="button" className="min-h-12 rounded-lg px-3 font-semibold text-bad underline underline-offset-4" aria-label={`Remove extra item ${i + 1}`} onClick={() => remove(i)}>
            Remove
          </button>
        </fieldset>
      ))}
      <button type="button" className="min-h-12 self-start rounded-lg border-2 border-ink bg-card px-4 font-semibold" onClick={() => append({ binCode: '', quantity: '' })}>
        Add an extra item
      </button>
    </section>
  );
}
