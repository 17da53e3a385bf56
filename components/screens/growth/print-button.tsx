/** Devices: no print dialog here; the sheet travels as CSV or JSON (see print-button.web.tsx). */
export function PrintButton(_props: { label?: string }) {
  return null;
}
