import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { AvailableAnswer } from '@/trees/engine-types';
import { colors, fonts, radius, space, touchTarget } from '@/components/theme';

/** The answers of an ask or action step as large buttons, one per line. */
export function AnswerButtons({ answers, onAnswer, busy }: { answers: AvailableAnswer[]; onAnswer: (a: AvailableAnswer) => void; busy: boolean }) {
  return (
    <View style={styles.list} accessibilityRole="radiogroup" accessibilityLabel="Answers" testID="step-answers">
      {answers.map((a) => (
        <Pressable
          key={a.event}
          accessibilityRole="button"
          accessibilityLabel={a.label}
          accessibilityState={{ disabled: busy }}
          disabled={busy}
          onPress={() => onAnswer(a)}
          testID={`answer-${a.event}`}
          style={({ pressed }) => [styles.button, pressed && styles.pressed, busy && styles.off]}
        >
          <Text style={styles.text}>{a.label}</Text>
          <Text style={styles.arrow} aria-hidden>
            ›
          </Text>
        </Pressable>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.md },
  button: {
    minHeight: touchTarget + 16,
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
    paddingHorizontal: space.lg,
    paddingVertical: space.md,
    borderRadius: radius.md,
    borderWidth: 2,
    borderColor: colors.accent,
    backgroundColor: colors.surface,
  },
  pressed: { backgroundColor: colors.accentSoft },
  off: { opacity: 0.5 },
  text: { flex: 1, fontFamily: fonts.bold, fontSize: 18, lineHeight: 24, color: colors.accentDark },
  arrow: { fontFamily: fonts.bold, fontSize: 24, color: colors.accent },
});
