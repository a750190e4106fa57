import { useId, useState } from 'react';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch, type Resolver } from 'react-hook-form';
import { z } from 'zod';
import { ALL_DRILLS } from '@shared/drills/drill-sizes';
import { FINAL_DRILL } from '@shared/estimate/rivet-rules';
import { binKindRules, createBinBodySchema, type BinFields } from '@shared/schemas/bins';
import { BLIND_GRIP_RANGES, blindGripRange, fastenerDesignation } from '@shared/stock/fasteners';
import { BIN_KIND_LABELS, BIN_KINDS, isBlindKind, isRivetKind, RIVET_MATERIALS, rivetHeadChoices, STEM_MATERIALS } from '@shared/stock/kinds';
import { SelectField, TextAreaField, TextField } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/errors';
import { diameterText, gripDashText, lengthText } from '../utils/format';
import { RivetCaution } from './rivet-caution';

type FormInput = z.input<typeof createBinBodySchema>;
export type BinFormOutput = z.output<typeof createBinBodySchema>;

/** Text as typed into a number field: empty or not a number fails the schema with its own message. */
const asNumber = (v: unknown) => (typeof v === 'string' ? (v.trim() === '' ? Number.NaN : Number(v)) : v);
const asNullableNumber = (v: unknown) => (v === '' || v === null || v === undefined ? null : Number(v));
const asNullableInches = (v: unknown) => (typeof v === 'string' && v.trim() === '' ? null : asNullableNumber(v));
const asNullable = (v: unknown) => (typeof v === 'string' && v.trim() === '' ? null : v);

/**
 * Fields the chosen kind does not show are cleared before the schema checks the form, so switching
 * a bin from a rivet to a screw does not leave a hidden spec behind.
 */
function forKind(v: FormInput): FormInput {
  const rivet = isRivetKind(v.kind);
  const blind = isBlindKind(v.kind);
  return {
    ...v,
    head: rivet ? v.head : null,
    material: rivet ? v.material : null,
    diameter32: rivet ? v.diameter32 : null,
    stemMaterial: blind ? v.stemMaterial : null,
    grip16: blind ? v.grip16 : null,
    gripMin: blind ? v.gripMin : null,
    gripMax: blind ? v.gripMax : null,
    holeDrill: blind ? v.holeDrill : null,
    length16: v.kind === 'solid_rivet' ? v.length16 : null,
    drillSize: v.kind === 'drill_bit' ? v.drillSize : null,
  };
}

const schemaResolver = zodResolver(createBinBodySchema);
/** zod skips an object's refinements while any field fails, so the kind rules also run alone: every gap shows at once. */
const kindRulesResolver = zodResolver(z.looseObject({}).superRefine((b, ctx) => binKindRules(b, ctx)));
const resolver: Resolver<FormInput, unknown, BinFormOutput> = async (values, context, options) => {
  const cleaned = forKind(values);
  const result = await schemaResolver(cleaned, context, options);
  if (Object.keys(result.errors).length === 0) return result;
  const rules = await kindRulesResolver(cleaned, context, options as never);
  return { values: {}, errors: { ...rules.errors, ...result.errors } };
};

function defaults(bin?: BinFields): FormInput {
  if (!bin) {
    return {
      kind: 'blind_structural',
      name: '',
      unit: 'each',
      packSize: 100,
      unitCost: 0,
      supplier: '',
      supplierPart: '',
      leadTimeDays: 14,
      reorderPoint: 0,
      reorderQty: 0,
      location: '',
      notes: '',
      head: null,
      material: null,
      stemMaterial: null,
      diameter32: null,
      grip16: null,
      gripMin: null,
      gripMax: null,
      length16: null,
      drillSize: null,
      holeDrill: null,
      initialQuantity: 0,
    };
  }
  const { kind, name, unit, packSize, unitCost, supplier, supplierPart, leadTimeDays, reorderPoint, reorderQty, location, notes } = bin;
  const { head, stemMaterial, diameter32, grip16, length16, drillSize, holeDrill } = bin;
  // A range that is the table's band for the dash stays empty, so a new dash takes its own band.
  const band = grip16 === null ? undefined : blindGripRange(grip16);
  const fromBox = (value: number | null, table: number | undefined) => (value === table ? null : value);
  return {
    ...{ kind, name, unit, packSize, unitCost, supplier, supplierPart, leadTimeDays, reorderPoint, reorderQty, location, notes },
    ...{ head, stemMaterial: stemMaterial as FormInput['stemMaterial'], diameter32, grip16, length16, drillSize, holeDrill },
    gripMin: fromBox(bin.gripMin, band?.min),
    gripMax: fromBox(bin.gripMax, band?.max),
    material: bin.material as FormInput['material'],
  };
}

const FIELDS = [...Object.keys(defaults()), 'code'];

const opt = <T extends string | number>(values: readonly T[], label: (v: T) => string, empty: string) => [
  { value: '', label: empty },
  ...values.map((v) => ({ value: String(v), label: label(v) })),
];
const KIND_OPTIONS = BIN_KINDS.map((k) => ({ value: k, label: BIN_KIND_LABELS[k] }));
const headOptions = (solid: boolean, current: BinFields['head'] | undefined) => [{ value: '', label: 'Choose the head' }, ...rivetHeadChoices(solid, current)];
const MATERIAL_OPTIONS = opt(RIVET_MATERIALS, (m) => m, 'Choose the material');
const STEM_OPTIONS = opt(STEM_MATERIALS, (m) => m, 'Choose the stem');
const DIAMETER_OPTIONS = opt(
  Array.from({ length: 16 }, (_, i) => i + 1),
  (d) => `${diameterText(d)} (−${d})`,
  'Choose the diameter',
);
const GRIP_OPTIONS = [{ value: '', label: 'Choose the grip' }, ...BLIND_GRIP_RANGES.map((g) => ({ value: String(g.dash), label: gripDashText(g.dash, g) }))];
/** Solid rivet lengths from 1/8 in to 1 in by half dashes, then common longer ones. */
const SHOP_LENGTHS = [...Array.from({ length: 29 }, (_, i) => 2 + i / 2), 18, 20, 24, 28, 32];
const lengthOptions = (current: number | null | undefined) =>
  opt(
    current && !SHOP_LENGTHS.includes(current) ? [...SHOP_LENGTHS, current].sort((a, b) => a - b) : SHOP_LENGTHS,
    (l) => `−${l} (${lengthText(l)})`,
    'Choose the length',
  );

export function BinForm({ bin, submitLabel, onSubmit }: { bin?: BinFields; submitLabel: string; onSubmit: (body: BinFormOutput) => Promise<unknown> }) {
  const [initial] = useState(() => defaults(bin));
  const form = useForm<FormInput, unknown, BinFormOutput>({ resolver, defaultValues: initial });
  const { errors, isSubmitting } = form.formState;
  const drillListId = useId();
  const spec = useWatch({ control: form.control, name: ['kind', 'head', 'material', 'stemMaterial', 'diameter32', 'grip16', 'length16', 'name', 'gripMin', 'gripMax'] });
  const [kind, head, material, stemMaterial, diameter32, grip16, length16, name, gripMin, gripMax] = spec;
  const rivet = isRivetKind(kind);
  const blind = isBlindKind(kind);
  const band = blind && grip16 ? blindGripRange(grip16) : undefined;
  const typed = (v: unknown) => (typeof v === 'number' && Number.isFinite(v) ? v : null);
  const preview = rivet
    ? fastenerDesignation({
        kind,
        head: head ?? null,
        material: material ?? null,
        stemMaterial: blind ? (stemMaterial ?? null) : null,
        diameter32: diameter32 ?? null,
        grip16: blind ? (grip16 ?? null) : null,
        gripMin: blind ? typed(gripMin) : null,
        gripMax: blind ? typed(gripMax) : null,
        length16: blind ? null : (length16 ?? null),
      })
    : name?.trim();

  const submit = form.handleSubmit(async (values) => {
    try {
      await onSubmit(values);
    } catch (err) {
      form.setError('root', { message: applyServerErrors(err, (path, error) => form.setError(path as keyof FormInput, error), FIELDS) });
    }
  });

  /** Selects start on the form's own value, so the form never reads an unselected box as a change. */
  const select = <K extends 'kind' | 'head' | 'material' | 'stemMaterial' | 'diameter32' | 'grip16' | 'length16'>(field: K, setValueAs?: (v: unknown) => unknown) => ({
    defaultValue: String(initial[field] ?? ''),
    ...form.register(field, setValueAs ? { setValueAs } : {}),
  });
  const number = (field: 'packSize' | 'unitCost' | 'leadTimeDays' | 'reorderPoint' | 'reorderQty' | 'initialQuantity') => form.register(field, { setValueAs: asNumber });

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-5">
      {errors.root?.message && <Notice tone="bad">{errors.root.message}</Notice>}

      <fieldset className="flex flex-col gap-4">
        <legend className="mb-2 text-lg font-semibold">What the bin holds</legend>
        <div className="grid gap-4 sm:grid-cols-2">
          <SelectField label="Kind" options={KIND_OPTIONS} error={errors.kind?.message} {...select('kind')} />
          <TextField
            label="Name"
            hint={rivet ? 'Optional for rivets: the designation names them.' : 'What a member looks for, like "Screw #8-32 × 1/2 pan head".'}
            error={errors.name?.message}
            {...form.register('name')}
          />
          {!bin && (
            <TextField label="Label code" placeholder="B-0107" hint="Leave empty to take the next free code." error={errors.code?.message} {...form.register('code', { setValueAs: (v: string) => (v.trim() === '' ? undefined : v) })} />
          )}
          {rivet && (
            <>
              <SelectField label="Head" options={headOptions(kind === 'solid_rivet', head)} error={errors.head?.message} {...select('head', asNullable)} />
              <SelectField label="Body material" options={MATERIAL_OPTIONS} error={errors.material?.message} {...select('material', asNullable)} />
              {blind && <SelectField label="Stem" options={STEM_OPTIONS} error={errors.stemMaterial?.message} {...select('stemMaterial', asNullable)} />}
              <SelectField label="Diameter" hint="The dash is in 32nds of an inch." options={DIAMETER_OPTIONS} error={errors.diameter32?.message} {...select('diameter32', asNullableNumber)} />
              {blind ? (
                <SelectField label="Grip dash" hint="The dash is in 16ths; beside it, the sheet stack it takes." options={GRIP_OPTIONS} error={errors.grip16?.message} {...select('grip16', asNullableNumber)} />
              ) : (
                <SelectField label="Length" hint="The dash is in 16ths of an inch." options={lengthOptions(bin?.length16)} error={errors.length16?.message} {...select('length16', asNullableNumber)} />
              )}
              {blind && (
                <fieldset className="flex flex-col gap-2 sm:col-span-2">
                  <legend className="text-sm font-semibold">Grip range (from the box)</legend>
                  <p className="text-sm text-steel">The sheet stack the maker gives for these rivets, in inches. Left empty, it is the table's band for the grip dash.</p>
                  <div className="grid gap-4 sm:grid-cols-2">
                    <TextField label="Smallest grip (in)" inputMode="decimal" placeholder={band ? band.min.toFixed(3) : undefined} error={errors.gripMin?.message} {...form.register('gripMin', { setValueAs: asNullableInches })} />
                    <TextField label="Largest grip (in)" inputMode="decimal" placeholder={band ? band.max.toFixed(3) : undefined} error={errors.gripMax?.message} {...form.register('gripMax', { setValueAs: asNullableInches })} />
                  </div>
                </fieldset>
              )}
              {blind && (
                <TextField label="Hole drill, if the maker's differs" list={drillListId} placeholder={FINAL_DRILL.blind[Number(diameter32)] ?? '#30'} error={errors.holeDrill?.message} {...form.register('holeDrill', { setValueAs: asNullable })} />
              )}
            </>
          )}
          {kind === 'drill_bit' && (
            <TextField label="Drill size" list={drillListId} placeholder="#40" hint="Number (#1–#80), letter (A–Z) or fraction (1/8)." error={errors.drillSize?.message} {...form.register('drillSize', { setValueAs: asNullable })} />
          )}
          {(blind || kind === 'drill_bit') && (
            <datalist id={drillListId}>
              {ALL_DRILLS.map((d) => (
                <option key={d.name} value={d.name}>{`${d.inch.toFixed(4)} in`}</option>
              ))}
            </datalist>
          )}
        </div>
        <div className="rounded-lg border border-rule bg-paper px-4 py-3" aria-live="polite">
          <p className="text-sm font-semibold">Designation</p>
          <p className="font-mono text-base" data-testid="designation-preview">
            {preview || (rivet ? 'Choose the head and diameter to see it.' : 'Give the bin a name.')}
          </p>
        </div>
        {rivet && <RivetCaution kind={kind} />}
      </fieldset>

      <fieldset className="flex flex-col gap-4">
        <legend className="mb-2 text-lg font-semibold">Buying it</legend>
        <div className="grid gap-4 sm:grid-cols-2">
          <TextField label="Unit" hint='What one is counted as: "each", "tube", "box".' error={errors.unit?.message} {...form.register('unit')} />
          <TextField label="Pack size" inputMode="numeric" hint="Units in one pack from the supplier; orders round up to whole packs." error={errors.packSize?.message} {...number('packSize')} />
          <TextField label="Unit cost ($)" inputMode="decimal" hint="Per unit, up to 4 decimals, like 0.0825." error={errors.unitCost?.message} {...number('unitCost')} />
          <TextField label="Supplier" error={errors.supplier?.message} {...form.register('supplier')} />
          <TextField label="Supplier's part number" error={errors.supplierPart?.message} {...form.register('supplierPart')} />
          <TextField label="Lead time (days)" inputMode="numeric" error={errors.leadTimeDays?.message} {...number('leadTimeDays')} />
        </div>
      </fieldset>

      <fieldset className="flex flex-col gap-4">
        <legend className="mb-2 text-lg font-semibold">Keeping it stocked</legend>
        <div className="grid gap-4 sm:grid-cols-2">
          <TextField label="Reorder point" inputMode="numeric" hint="At or below this many on hand, the bin goes on the Restock list." error={errors.reorderPoint?.message} {...number('reorderPoint')} />
          <TextField label="Reorder quantity" inputMode="numeric" error={errors.reorderQty?.message} {...number('reorderQty')} />
          <TextField label="Location" hint="Cabinet, shelf or drawer." error={errors.location?.message} {...form.register('location')} />
          {!bin && (
            <TextField label="Opening stock" inputMode="numeric" hint="Already in the bin; written to its ledger as the first receipt." error={errors.initialQuantity?.message} {...form.register('initialQuantity', { setValueAs: (v: unknown) => (v === '' ? 0 : asNumber(v)) })} />
          )}
        </div>
        <TextAreaField label="Notes" {...form.register('notes')} />
      </fieldset>

      <FormFooter submit={submitLabel} busy={isSubmitting} />
    </form>
  );
}
