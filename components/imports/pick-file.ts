// Opens the system file picker and returns the chosen file in the shape the upload needs, or null if cancelled.
import * as DocumentPicker from 'expo-document-picker';
import type { UploadFile } from '@/hooks/queries/imports';
import { PICKER_TYPES } from './import-kinds';

export async function pickImportFile(): Promise<UploadFile | null> {
  // base64 off: the browser hands over the File itself, no need to read it into memory twice.
  const result = await DocumentPicker.getDocumentAsync({ type: PICKER_TYPES, multiple: false, base64: false, copyToCacheDirectory: true });
  if (result.canceled || !result.assets?.[0]) return null;
  const asset = result.assets[0];
  return { name: asset.name, file: asset.file, uri: asset.uri, mimeType: asset.mimeType };
}
