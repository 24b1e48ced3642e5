import { ChoiceChips } from './choice-chips';
import { FormField } from '@/components/ui/form-field';
import type { FieldDesc } from './field-types';
import { opts } from './field-types';

const YES_NO = opts(['yes', 'no'], { yes: 'Yes', no: 'No' });

interface Props {
  field: FieldDesc;
  value: string;
  onChange(value: string): void;
  error?: string;
  testID: string;
}

/** One described field: chips for choices and yes/no, a text box for numbers, dates and text. */
export function SpecField({ field, value, onChange, error, testID }: Props) {
  if (field.type === 'choice' || field.type === 'multi' || field.type === 'bool') {
    return (
      <ChoiceChips
        label={field.label}
        options={field.type === 'bool' ? YES_NO : (field.options ?? [])}
        multi={field.type === 'multi'}
        required={field.required}
        value={value}
        onChange={onChange}
        error={error}
        hint={field.hint}
        testID={testID}
      />
    );
  }
  return (
    <FormField
      label={field.required ? `${field.label} (required)` : field.label}
      value={value}
      onChangeText={onChange}
      error={error}
      hint={field.hint}
      keyboardType={field.type === 'number' ? 'decimal-pad' : 'default'}
      autoCapitalize={field.key === 'state' ? 'characters' : 'none'}
      placeholder={field.type === 'date' ? 'YYYY-MM-DD' : undefined}
      testID={testID}
    />
  );
}
