import { useState } from 'react';
import * as DocumentPicker from 'expo-document-picker';
import { maxUploadBytes } from '@/shared/api/family-upload';
import type { PickedFile } from '@/components/api/picked-file';

/** What the file input accepts; the server decides what the contents are. */
const csvTypes = ['text/csv', 'text/comma-separated-values', 'text/plain', 'application/vnd.ms-excel', '.csv'];

export type PickResult = { file: PickedFile } | { tooLarge: PickedFile } | null;

export function megabytes(bytes: number): string {
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

/**
 * Opens the system file chooser (a file input on the web) for one CSV file.
 * Files over the upload limit are refused here, before any upload.
 */
export function useCsvPicker() {
  const [picking, setPicking] = useState(false);
  const pick = async (): Promise<PickResult> => {
    setPicking(true);
    try {
      const result = await DocumentPicker.getDocumentAsync({ type: csvTypes, multiple: false, copyToCacheDirectory: true });
      if (result.canceled || !result.assets?.[0]) return null;
      const asset = result.assets[0];
      const file: PickedFile = { name: asset.name, size: asset.size, mimeType: asset.mimeType, uri: asset.uri, file: asset.file };
      if (file.size !== undefined && file.size > maxUploadBytes) return { tooLarge: file };
      return { file };
    } finally {
      setPicking(false);
    }
  };
  return { pick, picking };
}
