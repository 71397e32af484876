import { Text, type TextProps } from 'react-native';
import { colors, type } from './theme';

type Variant = keyof typeof type;

/** Text in the house type scale; `variant` picks size and weight. */
export function ThemedText({ variant = 'body', style, ...rest }: TextProps & { variant?: Variant; muted?: boolean }) {
  const { muted, ...props } = rest as TextProps & { muted?: boolean };
  return <Text {...props} style={[type[variant], { color: muted ? colors.inkMuted : colors.ink }, style]} />;
}
