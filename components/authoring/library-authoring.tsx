import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { Link } from 'expo-router';
import { AUTHORS } from '@/shared/roles';
import { SYMPTOM_LABELS } from '@/trees/tree-format';
import { useMe } from '@/hooks/use-session';
import { useRetiredTrees } from '@/hooks/use-tree-drafts';
import { colors, fonts, radius, space, touchTarget, type } from '@/components/theme';

/** For leads and owners on the library: write a new tree, and find retired trees to bring back. */
export function LibraryAuthoring() {
  const me = useMe();
  const author = !!me && AUTHORS.includes(me.role);
  const retired = useRetiredTrees(author);
  const [open, setOpen] = useState(false);
  if (!author) return null;
  const list = retired.data?.trees ?? [];
  return (
    <View style={styles.col}>
      <Link href="/trees/new" asChild>
        <Pressable accessibilityRole="link" style={styles.button} testID="new-tree">
          <Text style={styles.buttonText}>＋ New tree or import</Text>
        </Pressable>
      </Link>
      {list.length ? (
        <View style={styles.box}>
          <Pressable accessibilityRole="button" accessibilityState={{ expanded: open }} onPress={() => setOpen(!open)} style={styles.toggle} testID="retired-toggle">
            <Text style={styles.toggleText}>
              {open ? '▼' : '▶'} Retired trees ({list.length})
            </Text>
          </Pressable>
          {open
            ? list.map((t) => (
                <Link key={t.id} href={`/trees/${t.id}`} asChild>
                  <Pressable accessibilityRole="link" style={styles.item} testID={`retired-${t.id}`}>
                    <Text style={styles.itemTitle}>{t.title}</Text>
                    <Text style={styles.muted}>{SYMPTOM_LABELS[t.symptom]}</Text>
                  </Pressable>
                </Link>
              ))
            : null}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  col: { gap: space.md },
  button: { minHeight: touchTarget, alignSelf: 'flex-start', paddingHorizontal: space.xl, borderRadius: radius.md, justifyContent: 'center', backgroundColor: colors.accent },
  buttonText: { fontFamily: fonts.bold, fontSize: 17, color: colors.onAccent },
  box: { borderWidth: 1, borderColor: colors.line, borderRadius: radius.md, backgroundColor: colors.surface },
  toggle: { minHeight: touchTarget, justifyContent: 'center', paddingHorizontal: space.md },
  toggleText: { fontFamily: fonts.semibold, fontSize: 16, color: colors.ink },
  item: { minHeight: touchTarget, justifyContent: 'center', paddingHorizontal: space.md, paddingVertical: space.sm, borderTopWidth: 1, borderTopColor: colors.line },
  itemTitle: { ...type.label, color: colors.ink },
  muted: { ...type.small, color: colors.inkMuted },
});
