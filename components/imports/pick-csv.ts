import { getDocumentAsync } from 'expo-document-picker';
import type { UploadFile } from '@/hooks/use-imports';

export interface PickedFile {
  file: UploadFile;
  name: string;
  sizeBytes?: number;
}

/** Opens the system file picker for one CSV; null when the admin cancels. */
export async function pickCsv(): Promise<PickedFile | null> {
  // base64 off: on the web the picker would otherwise read the whole file into memory as a data URL.
  const result = await getDocumentAsync({ type: ['.csv', 'text/csv', 'text/plain', 'application/vnd.ms-excel'], multiple: false, base64: false });
  if (result.canceled || !result.assets?.length) return null;
  const asset = result.assets[0];
  const file: UploadFile = asset.file ?? { uri: asset.uri, name: asset.name, type: asset.mimeType ?? 'text/csv' };
  return { file, name: asset.name, sizeBytes: asset.size };
}
