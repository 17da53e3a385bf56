/** A file chosen with expo-document-picker (the parts Frostgrade uses). */
export type PickedFile = {
  name: string;
  /** Bytes, when the platform tells. */
  size?: number;
  mimeType?: string;
  /** Local URI on devices, a blob: URL in browsers. */
  uri: string;
  /** Browsers only: the File itself. */
  file?: File;
};
