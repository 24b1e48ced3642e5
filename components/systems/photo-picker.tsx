import { getDocumentAsync } from 'expo-document-picker';
import { Button } from 'react-native-paper';
import { TOUCH_TARGET } from '@/constants/theme';
import type { PhotoPickerProps } from './photo-picker-types';

/** Outside the web: the system picker for one image. */
export function PhotoPickButton({ label, icon, disabled, onPicked, testID }: PhotoPickerProps) {
  const pick = async () => {
    const result = await getDocumentAsync({ type: 'image/*', multiple: false, base64: false });
    if (result.canceled || !result.assets?.length) return;
    const asset = result.assets[0];
    onPicked({ file: asset.file ?? { uri: asset.uri, name: asset.name, type: asset.mimeType ?? 'image/jpeg' }, name: asset.name });
  };
  return (
    <Button mode="outlined" icon={icon} disabled={disabled} onPress={() => void pick()} contentStyle={{ minHeight: TOUCH_TARGET }} testID={testID}>
      {label}
    </Button>
  );
}
