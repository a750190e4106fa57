import { z } from 'zod';
import { BIN_CODE_PATTERN } from '../stock/kinds';
import { TOOL_CODE_PATTERN } from './tools';

export const MAX_LABELS_PER_REQUEST = 300;

/** A code a label can carry: a tool's (T-0042) or a bin's (B-0107). */
export const labelCodeField = z
  .string({ error: 'Enter the code on the label, like T-0042 or B-0107.' })
  .trim()
  .toUpperCase()
  .refine((code) => TOOL_CODE_PATTERN.test(code) || BIN_CODE_PATTERN.test(code), {
    error: 'A label code looks like T-0042 for a tool or B-0107 for a bin: the letter, a dash and four to six digits.',
  });

/** The sheet's fields; the body adds that something is picked, and not too much. */
export const labelSheetFieldsSchema = z
  .object({
    layoutId: z.string({ error: 'Choose a sheet layout.' }).trim().min(1, { error: 'Choose a sheet layout.' }),
    codes: z
      .array(labelCodeField, { error: 'Send the codes as a list, like ["T-0042", "B-0107"].' })
      .max(MAX_LABELS_PER_REQUEST, { error: `Print at most ${MAX_LABELS_PER_REQUEST} labels at a time.` })
      .default([]),
    /** People to print a crib-station badge for, by id: printing issues each a new badge (the old one stops working). */
    people: z
      .array(z.number({ error: 'Send people as a list of ids, like [3, 7].' }).int({ error: 'A person id is a whole number.' }).positive({ error: 'A person id is a whole number.' }), {
        error: 'Send people as a list of ids, like [3, 7].',
      })
      .max(MAX_LABELS_PER_REQUEST, { error: `Print at most ${MAX_LABELS_PER_REQUEST} labels at a time.` })
      .default([]),
    skip: z
      .number({ error: 'Enter how many labels on the first sheet are already used, or 0.' })
      .int({ error: 'Enter a whole number of used labels.' })
      .min(0, { error: 'Used labels cannot be fewer than 0.' })
      .max(MAX_LABELS_PER_REQUEST - 1, { error: 'That is more used labels than any sheet has.' })
      .default(0),
  })
  .strict();

/** A label sheet to print: which layout, which tool and bin codes and which people (one label each, in order), how many positions are used. */
export const labelSheetBodySchema = labelSheetFieldsSchema
  .refine((b) => b.codes.length + b.people.length > 0, { error: 'Pick at least one tool, bin or person to label.', path: ['codes'] })
  .refine((b) => b.codes.length + b.people.length <= MAX_LABELS_PER_REQUEST, { error: `Print at most ${MAX_LABELS_PER_REQUEST} labels at a time.`, path: ['people'] });
export type LabelSheetBody = z.input<typeof labelSheetBodySchema>;
export type LabelSheetInput = z.output<typeof labelSheetBodySchema>;

const size = z.strictObject({ width: z.number(), height: z.number() });

/** A sheet layout as the API sends it: lengths in the layout's own unit. */
export const sheetLayoutSchema = z.strictObject({
  id: z.string(),
  name: z.string(),
  media: z.enum(['sheet', 'thermal-roll']),
  unit: z.enum(['in', 'mm']),
  page: size,
  label: size,
  columns: z.number().int().positive(),
  rows: z.number().int().positive(),
  margin: z.strictObject({ top: z.number(), left: z.number() }),
  gap: z.strictObject({ horizontal: z.number(), vertical: z.number() }),
});
export type SheetLayoutDto = z.infer<typeof sheetLayoutSchema>;

export const sheetLayoutListSchema = z.strictObject({ data: z.array(sheetLayoutSchema) });

/** GET /api/labels/people: who can have a badge printed (active people), and who has one already. */
export const labelPersonSchema = z.strictObject({ id: z.number().int(), name: z.string(), hasBadge: z.boolean() });
export type LabelPerson = z.infer<typeof labelPersonSchema>;
export const labelPeopleListSchema = z.strictObject({ data: z.array(labelPersonSchema) });

/** What a badge label prints large where a tool or bin label prints its code: the token is in the QR only. */
export const BADGE_LABEL_WORD = 'BADGE';
