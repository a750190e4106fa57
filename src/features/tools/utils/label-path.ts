import { TOOL_CODE_PATTERN } from '@shared/schemas/tools';
import { BIN_CODE_PATTERN } from '@shared/stock/kinds';

/** Where a scanned label leads: a tool code opens the tool, a bin code the bin; anything else is not ours. */
export function labelPath(raw: string): string | undefined {
  const code = raw.trim().toUpperCase();
  if (TOOL_CODE_PATTERN.test(code)) return `/tools/${code}`;
  if (BIN_CODE_PATTERN.test(code)) return `/bins/${code}`;
  return undefined;
}

/** What a scan or a typed code that is no label of ours is told. */
export const notALabelWords = (raw: string): string =>
  `"${raw.slice(0, 40)}" is not a Gripline label. Tool codes look like T-0042, bin codes like B-0107.`;
