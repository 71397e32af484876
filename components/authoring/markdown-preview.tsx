import { StyleSheet, Text, View } from 'react-native';
import Markdown from 'react-native-markdown-display';
import { colors, fonts, radius, space, type } from '@/components/theme';

// The markdown renderer does not inherit fontFamily, so every text style names it.
const mdStyle = {
  body: { fontFamily: fonts.regular, fontSize: 17, lineHeight: 25, color: colors.ink },
  paragraph: { marginTop: 0, marginBottom: space.sm },
  strong: { fontFamily: fonts.bold, fontWeight: 'normal' as const },
  em: { fontFamily: fonts.regular, fontStyle: 'italic' as const },
  heading1: { fontFamily: fonts.bold, fontSize: 21, lineHeight: 28, marginBottom: space.sm },
  heading2: { fontFamily: fonts.bold, fontSize: 19, lineHeight: 26, marginBottom: space.sm },
  heading3: { fontFamily: fonts.semibold, fontSize: 18, lineHeight: 24, marginBottom: space.xs },
  bullet_list: { marginBottom: space.sm },
  ordered_list: { marginBottom: space.sm },
  list_item: { fontFamily: fonts.regular, marginBottom: space.xs },
  code_inline: { fontFamily: fonts.semibold, backgroundColor: colors.paper },
  link: { color: colors.accentDark, fontFamily: fonts.semibold },
};

/** The step text as the technician will see it, updated as the author types. */
export function MarkdownPreview({ markdown, testID }: { markdown: string; testID?: string }) {
  return (
    <View style={styles.box} testID={testID}>
      <Text style={styles.label}>Preview</Text>
      {markdown.trim() ? <Markdown style={mdStyle}>{markdown}</Markdown> : <Text style={styles.empty}>Nothing written yet.</Text>}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderWidth: 1, borderStyle: 'dashed', borderColor: colors.line, borderRadius: radius.md, padding: space.md, backgroundColor: colors.surface, gap: space.xs },
  label: { ...type.label, color: colors.inkMuted },
  empty: { ...type.small, color: colors.inkMuted },
});
