import type { LedgerExportQuery } from '@shared/schemas/bin-import';
import type { Bin } from '@shared/schemas/bins';
import type { ServiceContext } from '../../context';
import { centsCell, textCell as text, toCsv, type CsvCell as Cell } from '../../lib/csv';
import { HttpError } from '../../lib/http-error';
import { readChapterTimeZone } from '../../settings/chapter-time-zone';
import { binDesignation } from '@shared/stock/fasteners';
import { chapterDaySpan } from '@shared/time/chapter-time';
import { toBinDto } from './bin-dto';
import { BIN_COLUMNS, isNumericColumn } from './bin-csv';
import { ALL_BINS } from './bin-import.service';
import { listBins } from './bins.repo';
import { listMovements } from './ledger.repo';
import type { NameAssemblies } from './assembly-names';
import { e4ToDollars, valueCents } from '@shared/stock/money';

/** The export's columns are the import's, so a file exported from one chapter imports into another. */
const BIN_EXPORT_FIELDS = [...BIN_COLUMNS.map((c) => c.name), 'designation', 'on_hand'];

function binCells(bin: Bin): Cell[] {
  const cells = BIN_COLUMNS.map((c): Cell => {
    const value = c.field === 'initialQuantity' ? bin.onHand : bin[c.field];
    if (isNumericColumn(c)) return typeof value === 'number' ? value : null;
    return text(value === null || value === undefined ? null : String(value));
  });
  return [...cells, text(bin.designation), bin.onHand];
}

/** Every bin, opening stock set to what is on hand now. */
export function binsCsv(ctx: ServiceContext): string {
  const bins = listBins(ctx.db, ALL_BINS).rows.map((row) => toBinDto(row));
  return toCsv(BIN_EXPORT_FIELDS, bins.map(binCells));
}

const LEDGER_FIELDS = ['id', 'at', 'bin_code', 'designation', 'kind', 'quantity', 'balance_after', 'unit_cost', 'value', 'by', 'for_member', 'assembly_id', 'assembly', 'build', 'note', 'reverses_id'];
const LEDGER_EXPORT_LIMIT = 500_000;

/** Every ledger entry from the first day to the last, whole chapter days, oldest first. */
export function ledgerCsv(ctx: ServiceContext, nameAssemblies: NameAssemblies, range: LedgerExportQuery): string {
  const { start: from, end: to } = chapterDaySpan(range.from, range.to, readChapterTimeZone(ctx.db));
  const entries = listMovements(ctx.db, { from, to, limit: LEDGER_EXPORT_LIMIT + 1 });
  if (entries.length > LEDGER_EXPORT_LIMIT) {
    throw new HttpError(400, 'RANGE_TOO_LARGE', `More than ${LEDGER_EXPORT_LIMIT} ledger entries fall in that range. Export a shorter range.`);
  }
  const designations = new Map(listBins(ctx.db, ALL_BINS).rows.map((b) => [b.code, binDesignation(b)]));
  const assemblies = nameAssemblies(
    ctx.db,
    entries.flatMap(({ m }) => (m.assemblyId === null ? [] : [m.assemblyId])),
  );
  // listMovements answers newest first (at, then id); the reverse is oldest first.
  const rows = entries.reverse().map(({ m, binCode, actorName, memberName }): Cell[] => [
    m.id,
    m.at.toISOString(),
    text(binCode),
    text(designations.get(binCode)),
    m.kind,
    m.quantity,
    m.balanceAfter,
    e4ToDollars(m.unitCostE4),
    centsCell(valueCents(m.quantity, m.unitCostE4)),
    text(actorName),
    text(memberName),
    m.assemblyId,
    text(m.assemblyId === null ? null : assemblies.get(m.assemblyId)?.name),
    text(m.assemblyId === null ? null : assemblies.get(m.assemblyId)?.buildName),
    text(m.note),
    m.reversesId,
  ]);
  return toCsv(LEDGER_FIELDS, rows);
}

/** A header and two example bins: a blind rivet by its spec, and a screw by its name. */
export function templateCsv(): string {
  const examples: Record<string, Cell>[] = [
    { kind: 'blind_structural', head: 'dome', material: '5056', stem_material: 'steel', diameter_32nds: '1/8', grip_dash: 2, unit: 'each', pack_size: 100, unit_cost: 0.12, supplier: 'Cedar Valley Fastener Supply', lead_time_days: 10, reorder_point: 200, reorder_qty: 500, location: 'Shelf A2', opening_stock: 500 },
    { kind: 'Screw', name: 'Screw #8-32 × 1/2 pan head, stainless', unit: 'each', pack_size: 50, unit_cost: 0.09, supplier: 'Cedar Valley Fastener Supply', supplier_part: 'PS832-8', lead_time_days: 14, reorder_point: 40, reorder_qty: 100, location: 'Drawer C4', opening_stock: 120 },
  ];
  return toCsv(
    BIN_COLUMNS.map((c) => c.name),
    examples.map((e) => BIN_COLUMNS.map((c) => e[c.name] ?? null)),
  );
}
