import { useEffect } from 'react';

const styleId = 'frostgrade-sheet-print';

/**
 * One printed page for the growth sheet, legible in black and white.
 * Everything is scoped to documents that hold a sheet (`data-print-sheet`):
 * every ancestor of the sheet lets its content flow (the app's scroll views
 * are otherwise clipped to the window), every sibling along the way — the
 * navigation, the page header, other sections — is not printed, and inside
 * the sheet what is marked screen-only (buttons, links, settings) goes.
 * Colours become black on white; borders carry the structure. Fills that
 * carry meaning (the zone diagram's doping shading, `data-print-fill`) stay,
 * printed exactly, and read in black and white too: the ramp darkens with doping.
 */
export const sheetPrintCss = `
@media print {
  @page { margin: 11mm 12mm; }
  html:has([data-print-sheet]), html:has([data-print-sheet]) body { background: #fff !important; height: auto !important; overflow: visible !important; }
  *:has([data-print-sheet]) {
    height: auto !important; min-height: 0 !important; max-height: none !important; overflow: visible !important;
    flex: none !important; position: static !important; padding: 0 !important; margin: 0 !important;
    border: 0 !important; background: transparent !important; box-shadow: none !important; transform: none !important;
  }
  *:has([data-print-sheet]) > :not(:has([data-print-sheet])):not([data-print-sheet]) { display: none !important; }
  [data-print-sheet] { width: 100% !important; max-width: none !important; border: 0 !important; padding: 0 !important; gap: 10px !important; }
  [data-print-sheet] [data-print="hide"] { display: none !important; }
  [data-print-sheet] * { color: #000 !important; border-color: #000 !important; box-shadow: none !important; }
  [data-print-sheet] *:not([data-print-fill]) { background-color: transparent !important; }
  [data-print-sheet] [data-print-fill] { -webkit-print-color-adjust: exact !important; print-color-adjust: exact !important; }
  [data-print-sheet] [role="row"], [data-print-sheet] [data-testid^="zone-row-"] { break-inside: avoid; }
}
@media screen {
  [data-print-sheet] [data-print="only"] { display: none !important; }
}
@media print {
  [data-print-sheet] [data-side-scroll="scroller"] { overflow: visible !important; }
  [data-print-sheet] [data-side-scroll="scroller"] > * { width: 100% !important; }
  [data-print-sheet] [data-side-scroll="fade"], [data-print-sheet] [data-side-scroll="cue"] { display: none !important; }
}
`;

/** Web: adds the print stylesheet while a sheet is on the page, removes it after. */
export function PrintStyles() {
  useEffect(() => {
    if (typeof document === 'undefined' || document.getElementById(styleId)) return undefined;
    const style = document.createElement('style');
    style.id = styleId;
    style.textContent = sheetPrintCss;
    document.head.appendChild(style);
    return () => style.remove();
  }, []);
  return null;
}
