import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch } from 'react-hook-form';
import { toast } from 'sonner';
import type { z } from 'zod';
import { labelSheetFieldsSchema, MAX_LABELS_PER_REQUEST, type SheetLayoutDto } from '@shared/schemas/labels';
import { SelectField, TextField } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/errors';
import { useDownloadLabelSheet } from '../api/download-label-sheet';
import { describeSheet } from '../utils/sheet-summary';

const sheetOptionsSchema = labelSheetFieldsSchema.pick({ layoutId: true, skip: true });
type Input = z.input<typeof sheetOptionsSchema>;
type Output = z.output<typeof sheetOptionsSchema>;

const perPageOf = (layout: SheetLayoutDto | undefined) => (layout ? layout.columns * layout.rows : 1);

interface LabelSheetFormProps {
  layouts: readonly SheetLayoutDto[];
  codes: readonly string[];
  /** People whose badges print after the codes' labels (each is issued anew). */
  people?: readonly number[];
  /** What the summary says before anything is picked. */
  nothingPicked?: string;
}

/** The sheet layout, the labels already used on the first sheet, and the download. */
export function LabelSheetForm({ layouts, codes, people = [], nothingPicked }: LabelSheetFormProps) {
  const download = useDownloadLabelSheet();
  const form = useForm<Input, unknown, Output>({
    resolver: zodResolver(sheetOptionsSchema),
    defaultValues: { layoutId: layouts[0]?.id ?? '', skip: 0 },
  });
  const { errors } = form.formState;
  const [layoutId, skipValue] = useWatch({ control: form.control, name: ['layoutId', 'skip'] });
  const layout = layouts.find((l) => l.id === layoutId);
  const perPage = perPageOf(layout);
  const skipShown = perPage > 1 && Number.isInteger(skipValue) && skipValue! >= 0 && skipValue! < perPage ? skipValue! : 0;
  const count = codes.length + people.length;
  const tooMany = count > MAX_LABELS_PER_REQUEST;

  const submit = form.handleSubmit(async (options) => {
    const skip = perPage > 1 ? options.skip : 0;
    if (count === 0) return form.setError('root', { message: 'Pick at least one tool, bin or person to label.' });
    if (skip >= perPage) {
      return form.setError('skip', { message: `A page of this layout has ${perPage} labels, so at most ${perPage - 1} can be already used.` });
    }
    try {
      await download.mutateAsync({ layoutId: options.layoutId, codes: [...codes], ...(people.length > 0 && { people: [...people] }), skip });
      toast.success(`Label sheet downloaded: ${describeSheet(count, skip, perPage)}`);
    } catch (err) {
      form.setError('root', { message: applyServerErrors(err, form.setError, ['layoutId', 'skip']) });
    }
  });

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      {errors.root?.message && <Notice tone="bad">{errors.root.message}</Notice>}
      <div className="grid gap-3 sm:grid-cols-[2fr_1fr]">
        <SelectField
          label="Sheet layout"
          options={layouts.map((l) => ({ value: l.id, label: l.name }))}
          error={errors.layoutId?.message}
          {...form.register('layoutId', {
            // One label per page: nothing can be used already, whatever the field said before.
            onChange: (e: { target: { value: string } }) => {
              if (perPageOf(layouts.find((l) => l.id === e.target.value)) === 1) form.setValue('skip', 0);
            },
          })}
        />
        {perPage > 1 && (
          <TextField
            label="Labels already used on the first sheet"
            type="number"
            inputMode="numeric"
            min={0}
            max={perPage - 1}
            hint={`0 for a new sheet; at most ${perPage - 1}. Used labels are counted row by row from the top left.`}
            error={errors.skip?.message}
            {...form.register('skip', { valueAsNumber: true })}
          />
        )}
      </div>
      <p className="font-medium" aria-live="polite">
        {describeSheet(count, skipShown, perPage, nothingPicked)}
      </p>
      {tooMany && (
        <Notice tone="warn">
          Print at most {MAX_LABELS_PER_REQUEST} labels at a time: take {count - MAX_LABELS_PER_REQUEST} off the list.
        </Notice>
      )}
      <Notice title="Print at actual size">
        Print the PDF at 100 % (not “fit to page”), or the labels drift off the sheet. Try a first page on plain paper and hold it
        against a label sheet to the light.
      </Notice>
      {people.length > 0 && <Notice tone="warn">Printing a badge replaces that person’s old one.</Notice>}
      <FormFooter submit="Download label sheet (PDF)" busy={download.isPending} disabled={count === 0 || tooMany} />
    </form>
  );
}
