/**
 * Reads an uploaded measured table in a worker thread: parsing, the grid
 * checks and the engine's spline take up to about a second at the size caps,
 * which the API's event loop owes to other requests.
 */
import type { UploadPreview } from '../../shared/api';
import { parseTableCsv, TableLimitError } from '../../shared/families/parse-table-csv';

/** The preview, or why the file was refused whole (a size cap: nothing below it was checked). */
export type UploadThreadAnswer = { preview: UploadPreview } | { refused: string };

/** Run by the API's thread pool (server/services/api-threads.ts). */
export default function readUpload(text: string): UploadThreadAnswer {
  try {
    return { preview: parseTableCsv(text) };
  } catch (err) {
    if (err instanceof TableLimitError) return { refused: err.message };
    throw err;
  }
}
