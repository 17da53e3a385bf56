const plainNumber = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

export type NumberVerdict = { ok: true; value: number } | { ok: false; message: string };

/**
 * Strict number reading for measured tables: `Number('')` is 0 and
 * `parseFloat('3abc')` is 3, both of which would silently corrupt a family.
 */
export function parseCell(raw: string, delimiter: string): NumberVerdict {
  const cell = raw.trim();
  if (cell === '') return { ok: false, message: 'is empty' };
  if (/^[+-]?(nan|inf|infinity)$/i.test(cell)) return { ok: false, message: `"${cell}" is not a finite number` };
  if (delimiter === ';' && /^[+-]?\d+,\d+([eE][+-]?\d+)?$/.test(cell)) {
    return { ok: false, message: `"${cell}" uses a decimal comma; write ${cell.replace(',', '.')}` };
  }
  if (!plainNumber.test(cell)) return { ok: false, message: `"${cell}" is not a number` };
  const value = Number(cell);
  if (!Number.isFinite(value)) return { ok: false, message: `"${cell}" is out of range` };
  return { ok: true, value };
}
