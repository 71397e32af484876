import { StyleSheet, Text, View } from 'react-native';
import { MarkdownText } from '@/components/markdown';
import { colors, radius, space, type } from '@/components/theme';

/** The step text as the technician will see it, updated as the author types. */
export function MarkdownPreview({ markdown, testID }: { markdown: string; testID?: string }) {
  return (
    <View style={styles.box} testID={testID}>
      <Text style={styles.label}>Preview</Text>
      {markdown.trim() ? <MarkdownText markdown={markdown} /> : <Text style={styles.empty}>Nothing written yet.</Text>}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderWidth: 1, borderStyle: 'dashed', borderColor: colors.line, borderRadius: radius.md, padding: space.md, backgroundColor: colors.surface, gap: space.xs },
  label: { ...type.label, color: colors.inkMuted },
  empty: { ...type.small, color: colors.inkMuted },
});
