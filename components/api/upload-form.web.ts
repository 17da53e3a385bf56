import type { PickedFile } from './picked-file';

/** Browsers: the picker hands over the File object itself. */
export function appendFile(form: FormData, field: string, file: PickedFile): void {
  if (!file.file) throw new Error(`The browser did not hand over the contents of ${file.name}.`);
  form.append(field, file.file, file.name);
}
