import type { PickedFile } from '@/components/api/picked-file';

/**
 * The text of a picked file, for reading it in the client before upload:
 * browsers hand over the File itself; devices give a local URI to read.
 */
export async function readPickedText(file: PickedFile): Promise<string> {
  if (file.file) return file.file.text();
  const response = await fetch(file.uri);
  return response.text();
}
