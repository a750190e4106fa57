import type { LedgerExportQuery } from '@shared/schemas/bin-import';
import type { BinFields, CreateBinInput } from '@shared/schemas/bins';
import type { ServiceContext } from '../../context';
import { centsCell, textCell as text, toCsv, type CsvCell as Cell } from '../../lib/csv';
import { HttpError } from '../../lib/http-error';
import { readChapterTimeZone } from '../../settings/chapter-time-zone';
import { binDesignation } from '@shared/stock/fasteners';
import { chapterDaySpan } from '@shared/time/chapter-time';
import { toBinFields } from './bin-dto';
import { BIN_COLUMNS, binCell } from './bin-csv';
import { ALL_BINS } from './bin-import-check';
import { listBins } from './bins.repo';
import { listMovements } from './ledger.repo';
import { assemblyNames } from '../planning/planning.reads';
import { e4ToDollars, valueCents } from '@shared/stock/money';

/** The export's columns are the import's, so a file exported from one chapter imports into another. */
const BIN_EXPORT_FIELDS = [...BIN_COLUMNS.map((c) => c.name), 'designation', 'on_hand'];

function binCells(bin: BinFields): Cell[] {
  const cells = BIN_COLUMNS.map((c) => binCell(c, c.field === 'initialQuantity' ? bin.onHand : bin[c.field]));
  return [...cells, text(bin.designation), bin.onHand];
}

/** Every bin, opening stock set to what is on hand now. */
export function binsCsv(ctx: ServiceContext): string {
  const bins = listBins(ctx.db, ALL_BINS).rows.map((row) => toBinFields(row));
  return toCsv(BIN_EXPORT_FIELDS, bins.map(binCells));
}

const LEDGER_FIELDS = ['id', 'at', 'bin_code', 'designation', 'kind', 'quantity', 'balance_after', 'unit_cost', 'value', 'by', 'for_member', 'assembly_id', 'assembly', 'build', 'note', 'reverses_id', 'station'];
const LEDGER_EXPORT_LIMIT = 500_000;

/** Every ledger entry from the first day to the last, whole chapter days, oldest first. */
export function ledgerCsv(ctx: ServiceContext, range: LedgerExportQuery): string {
  const { start: from, end: to } = chapterDaySpan(range.from, range.to, readChapterTimeZone(ctx.db));
  const entries = listMovements(ctx.db, { from, to, limit: LEDGER_EXPORT_LIMIT + 1 });
  if (entries.length > LEDGER_EXPORT_LIMIT) {
    throw new HttpError(400, 'RANGE_TOO_LARGE', `More than ${LEDGER_EXPORT_LIMIT} ledger entries fall in that range. Export a shorter range.`);
  }
  const designations = new Map(listBins(ctx.db, ALL_BINS).rows.map((b) => [b.code, binDesignation(b)]));
  const assemblies = assemblyNames(
    ctx.db,
    entries.flatMap(({ m }) => (m.assemblyId === null ? [] : [m.assemblyId])),
  );
  // listMovements answers newest first (at, then id); the reverse is oldest first.
  const rows = entries.reverse().map(({ m, binCode, actorName, memberName, stationName }): Cell[] => [
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
    // The station's name (through stations.reads, as on the ledger screen); empty when made on a person's own device.
    text(stationName),
  ]);
  return toCsv(LEDGER_FIELDS, rows);
}

/**
 * A header and two example bins, without codes (an import gives them the next free ones): a blind
 * rivet by its spec and a screw by its name. The cells are written as the export writes them, so a
 * template filled in and a file exported read alike.
 */
export function templateCsv(): string {
  const examples: Partial<Record<keyof CreateBinInput, unknown>>[] = [
    { kind: 'blind_structural', head: 'dome', material: '5056', stemMaterial: 'steel', diameter32: 4, grip16: 2, gripMin: 0.063, gripMax: 0.125, unit: 'each', packSize: 100, unitCost: 0.12, supplier: 'Cedar Valley Fastener Supply', leadTimeDays: 10, reorderPoint: 200, reorderQty: 500, location: 'Shelf A2', initialQuantity: 500 },
    { kind: 'screw', name: 'Screw #8-32 × 1/2 pan head, stainless', unit: 'each', packSize: 50, unitCost: 0.09, supplier: 'Cedar Valley Fastener Supply', supplierPart: 'PS832-8', leadTimeDays: 14, reorderPoint: 40, reorderQty: 100, location: 'Drawer C4', initialQuantity: 120 },
  ];
  return toCsv(
    BIN_COLUMNS.map((c) => c.name),
    examples.map((e) => BIN_COLUMNS.map((c) => binCell(c, e[c.field]))),
  );
}
