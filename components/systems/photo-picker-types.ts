import type { UploadFile } from '@/hooks/use-imports';

export interface PickedPhoto {
  file: UploadFile;
  name: string;
}

export interface PhotoPickerProps {
  label: string;
  icon: string;
  disabled?: boolean;
  onPicked(photo: PickedPhoto): void;
  testID?: string;
}
