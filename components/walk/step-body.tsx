import Markdown from 'react-native-markdown-display';
import { colors, fonts, space } from '@/components/theme';

// The markdown renderer does not inherit fontFamily: every text style names it.
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

/** A step's body text, written in markdown by the tree's author. */
export function StepBody({ markdown }: { markdown: string }) {
  if (!markdown.trim()) return null;
  return <Markdown style={mdStyle}>{markdown}</Markdown>;
}
