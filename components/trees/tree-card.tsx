import { Pressable, StyleSheet, Text, View } from 'react-native';
import { Link } from 'expo-router';
import type { TreeSummary } from '@/shared/schemas/trees';
import { INSTALL_TYPE_LABELS } from '@/trees/tree-format';
import { colors, fonts, radius, space, touchTarget, type } from '@/components/theme';

/** One tree in the library: title, what it is for, installs it applies to, size. Opens the tree page. */
export function TreeCard({ tree }: { tree: TreeSummary }) {
  return (
    <Link href={`/trees/${tree.id}`} asChild>
      {/* No separate label: the link is named by the text it shows, so speech and sight agree. */}
      <Pressable accessibilityRole="link" testID={`tree-card-${tree.slug}`} style={styles.card}>
        <Text style={styles.title}>{tree.title} ›</Text>
        {tree.summary ? (
          <Text style={styles.summary} numberOfLines={3}>
            {tree.summary}
          </Text>
        ) : null}
        <View style={styles.meta}>
          {tree.installTypes.map((t) => (
            <Text key={t} style={styles.tag}>
              {INSTALL_TYPE_LABELS[t]}
            </Text>
          ))}
          <Text style={styles.size}>
            {tree.steps === null ? 'Not published yet' : `${tree.steps} steps · version ${tree.publishedVersion}`}
          </Text>
        </View>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  card: {
    flexGrow: 1,
    flexShrink: 1,
    flexBasis: 300,
    // Without these a long title widens the card past a phone screen instead of wrapping.
    minWidth: 0,
    maxWidth: '100%',
    minHeight: touchTarget * 2,
    backgroundColor: colors.surface,
    borderRadius: radius.lg,
    borderWidth: 1,
    borderColor: colors.line,
    padding: space.lg,
    gap: space.sm,
  },
  title: { fontFamily: fonts.bold, fontSize: 19, lineHeight: 25, color: colors.accentDark },
  summary: { ...type.body, fontSize: 16, color: colors.inkMuted },
  meta: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, alignItems: 'center' },
  tag: { ...type.small, fontFamily: fonts.semibold, color: colors.ink, backgroundColor: colors.paper, borderRadius: radius.sm, paddingHorizontal: space.sm, paddingVertical: 2 },
  size: { ...type.small, color: colors.inkMuted },
});
