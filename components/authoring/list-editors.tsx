import { Pressable, StyleSheet, Text, View } from 'react-native';
import { HAZARDS, HAZARD_LABELS, type Hazard } from '@/trees/tree-format';
import { TextField } from '@/components/forms/text-field';
import { SegmentedChoice } from '@/components/forms/segmented-choice';
import { colors, fonts, radius, space, touchTarget, type } from '@/components/theme';

type Caution = { hazard: Hazard; text: string };
const hazardChoices = HAZARDS.map((h) => ({ value: h, label: HAZARD_LABELS[h] }));

/** A step's cautions: a hazard and what to watch for, shown to the technician before the question. */
export function CautionsEditor({ value, onChange, errors, testID }: { value: Caution[]; onChange: (v: Caution[]) => void; errors: Record<string, string>; testID: string }) {
  const set = (i: number, c: Caution) => onChange(value.map((x, j) => (j === i ? c : x)));
  return (
    <View style={styles.section} testID={testID}>
      <Text style={styles.head}>⚠ Cautions</Text>
      <Text style={styles.hint}>Shown first, above the question, wherever the step can hurt someone.</Text>
      {value.map((c, i) => (
        <View key={i} style={styles.item}>
          <SegmentedChoice label={`Caution ${i + 1}: hazard`} options={hazardChoices} value={c.hazard} onChange={(hazard) => set(i, { ...c, hazard })} testID={`${testID}-${i}-hazard`} />
          <TextField
            label="What to watch out for"
            value={c.text}
            onChangeText={(text) => set(i, { ...c, text })}
            multiline
            error={errors[`cautions.${i}.text`]}
            testID={`${testID}-${i}-text`}
          />
          <RemoveButton label={`Remove caution ${i + 1}`} onPress={() => onChange(value.filter((_, j) => j !== i))} testID={`${testID}-${i}-remove`} />
        </View>
      ))}
      {value.length < 8 ? <AddButton label="+ Add a caution" onPress={() => onChange([...value, { hazard: 'hot_parts', text: '' }])} testID={`${testID}-add`} /> : null}
    </View>
  );
}

/** Photo prompts: what the technician is asked to photograph at this step. */
export function PromptsEditor({ value, onChange, errors, testID }: { value: string[]; onChange: (v: string[]) => void; errors: Record<string, string>; testID: string }) {
  return (
    <View style={styles.section} testID={testID}>
      <Text style={styles.head}>Photo prompts</Text>
      {value.map((p, i) => (
        <View key={i} style={styles.inline}>
          <View style={styles.grow}>
            <TextField
              label={`Prompt ${i + 1}`}
              value={p}
              placeholder="Photograph the sensor seal"
              onChangeText={(text) => onChange(value.map((x, j) => (j === i ? text : x)))}
              error={errors[`photoPrompts.${i}`] ? 'Write the prompt, or remove it.' : undefined}
              testID={`${testID}-${i}`}
            />
          </View>
          <RemoveButton label={`Remove prompt ${i + 1}`} onPress={() => onChange(value.filter((_, j) => j !== i))} testID={`${testID}-${i}-remove`} />
        </View>
      ))}
      {value.length < 6 ? <AddButton label="+ Add a photo prompt" onPress={() => onChange([...value, ''])} testID={`${testID}-add`} /> : null}
    </View>
  );
}

/** A dashed "add" row button. */
export function AddButton({ label, onPress, testID }: { label: string; onPress: () => void; testID?: string }) {
  return (
    <Pressable accessibilityRole="button" onPress={onPress} style={({ pressed }) => [styles.add, pressed && styles.pressed]} testID={testID}>
      <Text style={styles.addText}>{label}</Text>
    </Pressable>
  );
}

/** A small remove button with its words (never an icon alone). */
export function RemoveButton({ label, onPress, testID }: { label: string; onPress: () => void; testID?: string }) {
  return (
    <Pressable accessibilityRole="button" accessibilityLabel={label} onPress={onPress} style={({ pressed }) => [styles.remove, pressed && styles.pressed]} testID={testID}>
      <Text style={styles.removeText}>✕ Remove</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.sm },
  head: { ...type.subheading, color: colors.ink },
  hint: { ...type.small, color: colors.inkMuted },
  item: { gap: space.sm, padding: space.md, borderRadius: radius.md, borderLeftWidth: 4, borderLeftColor: colors.caution, backgroundColor: colors.cautionSoft },
  inline: { flexDirection: 'row', alignItems: 'flex-end', gap: space.sm },
  grow: { flex: 1 },
  add: { minHeight: touchTarget, justifyContent: 'center', alignItems: 'center', borderRadius: radius.md, borderWidth: 2, borderStyle: 'dashed', borderColor: colors.accent },
  addText: { fontFamily: fonts.semibold, fontSize: 16, color: colors.accentDark },
  remove: { minHeight: touchTarget, justifyContent: 'center', paddingHorizontal: space.md, alignSelf: 'flex-start', borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface },
  removeText: { fontFamily: fonts.semibold, fontSize: 15, color: colors.danger },
  pressed: { opacity: 0.8 },
});
