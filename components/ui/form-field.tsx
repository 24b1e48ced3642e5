import { StyleSheet, View } from 'react-native';
import { HelperText, TextInput, type TextInputProps } from 'react-native-paper';

type Props = Omit<TextInputProps, 'error' | 'mode'> & {
  label: string;
  error?: string;
  hint?: string;
  testID?: string;
};

/** A labelled text field with its validation message (or a hint) under it. */
export function FormField({ label, error, hint, style, testID, ...input }: Props) {
  return (
    <View style={[styles.field, style]}>
      <TextInput mode="outlined" label={label} error={Boolean(error)} testID={testID} accessibilityLabel={label} {...input} />
      {error || hint ? (
        <HelperText type={error ? 'error' : 'info'} visible padding="none">
          {error ?? hint}
        </HelperText>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({ field: { gap: 2 } });
