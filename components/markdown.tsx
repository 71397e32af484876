import Markdown from 'react-native-markdown-display';
import { colors, fonts, space, type } from '@/components/theme';

// The markdown renderer does not inherit fontFamily, so every text style names it.
const mdStyle = {
  body: { ...type.body, color: colors.ink },
  paragraph: { marginTop: 0, marginBottom: space.sm },
  strong: { fontFamily: fonts.bold, fontWeight: 'normal' as const },
  em: { fontFamily: fonts.regular, fontStyle: 'italic' as const },
  heading1: { ...type.heading, marginBottom: space.sm },
  heading2: { fontFamily: fonts.bold, fontSize: 19, lineHeight: 26, marginBottom: space.sm },
  heading3: { ...type.subheading, marginBottom: space.xs },
  bullet_list: { marginBottom: space.sm },
  ordered_list: { marginBottom: space.sm },
  list_item: { fontFamily: fonts.regular, marginBottom: space.xs },
  code_inline: { fontFamily: fonts.semibold, backgroundColor: colors.paper },
  link: { color: colors.accentDark, fontFamily: fonts.semibold },
};

/** Markdown written by a tree's author, in Baywalk's type; nothing at all for blank text. */
export function MarkdownText({ markdown }: { markdown: string }) {
  if (!markdown.trim()) return null;
  return <Markdown style={mdStyle}>{markdown}</Markdown>;
}
