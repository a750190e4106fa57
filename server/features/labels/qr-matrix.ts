import QRCode from 'qrcode';

/** Light modules around the symbol, as the QR standard asks (ISO/IEC 18004: quiet zone of 4 modules). */
export const QUIET_ZONE_MODULES = 4;

/** A QR symbol with its quiet zone: `size` modules a side, `isDark(row, column)` for each. */
export interface QrMatrix {
  size: number;
  isDark(row: number, column: number): boolean;
}

/**
 * The QR matrix for a label's text, error correction level M (about 15 % of the symbol can be
 * scuffed or dirty and still read). The PDF renderer and the read-back test both draw from this.
 */
export function qrMatrix(text: string): QrMatrix {
  const { modules } = QRCode.create(text, { errorCorrectionLevel: 'M' });
  const inner = modules.size;
  return {
    size: inner + 2 * QUIET_ZONE_MODULES,
    isDark(row, column) {
      const r = row - QUIET_ZONE_MODULES;
      const c = column - QUIET_ZONE_MODULES;
      if (r < 0 || c < 0 || r >= inner || c >= inner) return false;
      return modules.data[r * inner + c] === 1;
    },
  };
}

/** Runs of dark modules per row (row, first column, length): fewer, seamless rectangles to draw. */
export function darkRuns(matrix: QrMatrix): { row: number; column: number; length: number }[] {
  const runs: { row: number; column: number; length: number }[] = [];
  for (let row = 0; row < matrix.size; row++) {
    let start = -1;
    for (let column = 0; column <= matrix.size; column++) {
      const dark = column < matrix.size && matrix.isDark(row, column);
      if (dark && start < 0) start = column;
      if (!dark && start >= 0) {
        runs.push({ row, column: start, length: column - start });
        start = -1;
      }
    }
  }
  return runs;
}
