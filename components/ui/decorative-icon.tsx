import type { ComponentProps } from 'react';
import { View } from 'react-native';
import { Icon } from 'react-native-paper';

type Props = Pick<ComponentProps<typeof Icon>, 'source' | 'size' | 'color'>;

/** An icon beside words that already say the same: hidden from screen readers so it is not read twice. */
export function DecorativeIcon(props: Props) {
  return (
    <View aria-hidden accessibilityElementsHidden importantForAccessibility="no-hide-descendants">
      <Icon {...props} />
    </View>
  );
}
