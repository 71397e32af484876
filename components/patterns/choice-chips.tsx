import { Pressable, ScrollView, StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, space, touchTarget, type } from '@/components/theme';

export interface Chip<T> {
  key: string;
  label: string;
  value: T;
}

/** A labelled row of chips, one picked (with a tick, not colour alone); scrolls sideways on a phone. */
export function ChoiceChips<T>({ label, chips, value, onChange, testID }: { label: string; chips: readonly Chip<T>[]; value: T; onChange: (v: T) => void; testID: string }) {
  return (
    <View style={styles.wrap}>
      <Text style={styles.label} nativeID={`${testID}-label`}>
        {label}
      </Text>
      <ScrollView horizontal showsHorizontalScrollIndicator={false} contentContainerStyle={styles.row} accessibilityLabel={label} testID={testID}>
        {chips.map((c) => {
          const picked = c.value === value;
          return (
            <Pressable
              key={c.key}
              role="radio"
              aria-checked={picked}
              accessibilityLabel={c.label}
              testID={`${testID}-${c.key}`}
              onPress={() => onChange(c.value)}
              style={[styles.chip, picked && styles.picked]}
            >
              <Text style={[styles.text, picked && styles.pickedText]} numberOfLines={1}>
                {picked ? '✓ ' : ''}
                {c.label}
              </Text>
            </Pressable>
          );
        })}
      </ScrollView>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  label: { ...type.label, color: colors.ink },
  row: { gap: space.sm, paddingVertical: 2 },
  chip: { minHeight: touchTarget, justifyContent: 'center', paddingHorizontal: space.lg, borderRadius: radius.lg, borderWidth: 2, borderColor: colors.line, backgroundColor: colors.surface, maxWidth: 320 },
  picked: { borderColor: colors.accent, backgroundColor: colors.accentSoft },
  text: { fontFamily: fonts.semibold, fontSize: 15, color: colors.ink },
  pickedText: { color: colors.accentDark },
});
