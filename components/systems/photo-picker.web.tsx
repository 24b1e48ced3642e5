import { useRef } from 'react';
import { Button } from 'react-native-paper';
import { TOUCH_TARGET } from '@/constants/theme';
import type { PhotoPickerProps } from './photo-picker-types';

/** On the web: a hidden file input for images; phones offer the camera as well as the library. */
export function PhotoPickButton({ label, icon, disabled, onPicked, testID }: PhotoPickerProps) {
  const input = useRef<HTMLInputElement>(null);
  return (
    <>
      <input
        ref={input}
        type="file"
        accept="image/*"
        capture="environment"
        style={{ display: 'none' }}
        data-testid={testID ? `${testID}-input` : undefined}
        aria-hidden
        tabIndex={-1}
        onChange={(e) => {
          const file = e.currentTarget.files?.[0];
          e.currentTarget.value = '';
          if (file) onPicked({ file, name: file.name || 'photo' });
        }}
      />
      <Button mode="outlined" icon={icon} disabled={disabled} onPress={() => input.current?.click()} contentStyle={{ minHeight: TOUCH_TARGET }} testID={testID}>
        {label}
      </Button>
    </>
  );
}
