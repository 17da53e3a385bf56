/** Devices have no print stylesheet (see print-styles.web.tsx); the sheet is shared as CSV/JSON there. */
export function PrintStyles() {
  return null;
}
