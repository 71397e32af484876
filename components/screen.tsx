import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { colors, maxContentWidth, space } from './theme';

/** A scrolling page: full width on a phone, centred with a maximum width on a wide screen. */
export function Screen({ children, testID }: { children: ReactNode; testID?: string }) {
  return (
    <ScrollView style={styles.scroll} contentContainerStyle={styles.outer} testID={testID}>
      <View style={styles.inner}>{children}</View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flex: 1, backgroundColor: colors.paper },
  outer: { alignItems: 'center', paddingVertical: space.xl, paddingHorizontal: space.lg },
  inner: { width: '100%', maxWidth: maxContentWidth, gap: space.lg },
});
