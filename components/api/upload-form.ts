import type { PickedFile } from './picked-file';

/** React Native's FormData takes a `{ uri, name, type }` part for a local file. */
type NativeFilePart = { uri: string; name: string; type: string };

/** Devices: the picked file travels by its local URI (see upload-form.web.ts for browsers). */
export function appendFile(form: FormData, field: string, file: PickedFile): void {
  const part: NativeFilePart = { uri: file.uri, name: file.name, type: file.mimeType ?? 'text/csv' };
  // RN's FormData accepts this part, which the DOM typings do not describe.
  form.append(field, part as unknown as Blob);
}
