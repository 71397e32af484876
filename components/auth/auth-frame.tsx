import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, Text, View } from 'react-native';
import { useDismissBootShell } from '@/components/boot-shell';
import { colors, radius, space, type } from '@/components/theme';

/** The frame of every sign-in screen: the product name, a card with the form, and an optional footer. */
export function AuthFrame({ children, footer }: { children: ReactNode; footer?: ReactNode }) {
  useDismissBootShell();
  return (
    <ScrollView style={styles.scroll} contentContainerStyle={styles.outer} keyboardShouldPersistTaps="handled">
      <View style={styles.column}>
        <View style={styles.brand}>
          <Text style={styles.title} accessibilityRole="header" aria-level={1}>
            Baywalk
          </Text>
          <Text style={styles.tagline}>Guided fault-finding for the days after an engine install.</Text>
        </View>
        <View style={styles.card}>{children}</View>
        {footer}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flex: 1, backgroundColor: colors.paper },
  outer: { flexGrow: 1, alignItems: 'center', paddingVertical: space.xxl, paddingHorizontal: space.lg },
  column: { width: '100%', maxWidth: 480, gap: space.xl },
  brand: { gap: space.xs },
  title: { ...type.title, fontSize: 34, lineHeight: 40, color: colors.accentDark },
  tagline: { ...type.body, color: colors.inkMuted },
  card: {
    backgroundColor: colors.surface,
    borderRadius: radius.lg,
    borderWidth: 1,
    borderColor: colors.line,
    padding: space.xl,
    gap: space.lg,
  },
});
