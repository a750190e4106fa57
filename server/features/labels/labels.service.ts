import { BADGE_LABEL_WORD, type LabelSheetInput } from '@shared/schemas/labels';
import { TOOL_CODE_PATTERN } from '@shared/schemas/tools';
import { BIN_CODE_PATTERN } from '@shared/stock/kinds';
import { findSheetLayout, labelsPerPage, SHEET_LAYOUTS, type SheetLayout } from '../../../labels/layouts';
import { issueBadges } from '../../accounts/badge.service';
import type { ServiceContext } from '../../context';
import type { UserRow } from '../../db/schema/users';
import { HttpError } from '../../lib/http-error';
import { renderLabelSheet, type LabelItem } from './label-sheet.renderer';
import { toolNamesByCode } from '../tools/tools.reads';
import { findBinLabels, type LabelText } from './labels.repo';

export function listLayouts(): readonly SheetLayout[] {
  return SHEET_LAYOUTS;
}

export interface LabelSheetFile {
  filename: string;
  pdf: Buffer;
}

/**
 * A PDF of tool and bin labels, one per code in the order given (a code may repeat for a second label),
 * then a badge for each person: printing a badge issues it, so that person's old badge stops working.
 */
export async function buildLabelSheet(ctx: ServiceContext, actor: UserRow, input: LabelSheetInput): Promise<LabelSheetFile> {
  const layout = layoutFor(input.layoutId, input.skip);
  const toolLabels = [...toolNamesByCode(ctx.db, input.codes.filter(isToolCode))].map(([code, name]): [string, LabelText] => [code, { title: name }]);
  const titles = new Map([...toolLabels, ...findBinLabels(ctx.db, input.codes.filter(isBinCode))]);
  const unknown = [...new Set(input.codes.filter((code) => !titles.has(code)))];
  if (unknown.length > 0) {
    throw new HttpError(
      400,
      'UNKNOWN_CODES',
      `${noOneHas(unknown)} the code${unknown.length > 1 ? 's' : ''} ${listed(unknown)}. Take ${unknown.length > 1 ? 'them' : 'it'} off the list or check the code.`,
      input.codes.flatMap((code, i) => (titles.has(code) ? [] : [{ path: `codes.${i}`, message: `${noOneHas([code])} the code ${code}.` }])),
    );
  }
  const badges = issueBadges(ctx, actor, input.people).map(({ name, badge }): LabelItem => ({ code: BADGE_LABEL_WORD, qr: badge, title: name }));
  const items: LabelItem[] = [...input.codes.map((code) => ({ code, ...titles.get(code)! })), ...badges];
  const pdf = await renderLabelSheet(layout, items, { skip: input.skip, createdAt: ctx.now() });
  return { filename: `gripline-labels-${layout.id}.pdf`, pdf };
}

const isToolCode = (code: string) => TOOL_CODE_PATTERN.test(code);
const isBinCode = (code: string) => BIN_CODE_PATTERN.test(code);

/** Names what the unknown codes were meant to be: a tool, a bin, or either. */
function noOneHas(codes: readonly string[]): string {
  if (codes.every(isToolCode)) return 'No tool has';
  if (codes.every(isBinCode)) return 'No bin has';
  return 'No tool or bin has';
}

function layoutFor(layoutId: string, skip: number): SheetLayout {
  const layout = findSheetLayout(layoutId);
  if (!layout) {
    const known = SHEET_LAYOUTS.map((l) => l.id).join(', ');
    throw new HttpError(400, 'VALIDATION_FAILED', `The request body is not valid. layoutId: use one of ${known}.`, [
      { path: 'layoutId', message: `There is no sheet layout "${layoutId}". Use one of ${known}.` },
    ]);
  }
  const perPage = labelsPerPage(layout);
  if (skip >= perPage) {
    const message = `A page of this layout has ${perPage} label${perPage > 1 ? 's' : ''}, so at most ${perPage - 1} can be already used.`;
    throw new HttpError(400, 'VALIDATION_FAILED', `The request body is not valid. skip: ${message}`, [{ path: 'skip', message }]);
  }
  return layout;
}

function listed(codes: string[]): string {
  const shown = codes.slice(0, 10);
  const rest = codes.length - shown.length;
  const text = shown.length > 1 ? `${shown.slice(0, -1).join(', ')} and ${shown.at(-1)}` : shown[0]!;
  return rest > 0 ? `${shown.join(', ')} and ${rest} more` : text;
}
