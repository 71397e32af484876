import { StyleSheet, Text, View } from 'react-native';
import { INSTALL_TYPES, INSTALL_TYPE_LABELS, type InstallType } from '@/trees/tree-format';
import type { InstallChange } from '@/shared/schemas/jobs';
import { SegmentedChoice } from '@/components/forms/segmented-choice';
import { TextField } from '@/components/forms/text-field';
import { Button } from '@/components/button';
import { colors, radius, space, type } from '@/components/theme';

const OPTIONS = INSTALL_TYPES.map((t) => ({ value: t, label: INSTALL_TYPE_LABELS[t] }));

/** The install as a list of changes, each with its kind and a few words. */
export function InstallEditor({ value, onChange, errors }: { value: InstallChange[]; onChange: (v: InstallChange[]) => void; errors: Record<string, string> }) {
  const set = (i: number, patch: Partial<InstallChange>) => onChange(value.map((c, j) => (j === i ? { ...c, ...patch } : c)));
  return (
    <View style={styles.wrap} testID="install-editor">
      <Text style={styles.label}>What was installed</Text>
      <Text style={styles.hint}>One entry per change; trees for these installs are suggested first.</Text>
      {value.map((c, i) => (
        <View key={i} style={styles.item} testID={`install-${i}`}>
          <SegmentedChoice<InstallType>
            label={`Change ${i + 1}`}
            options={OPTIONS}
            value={c.type}
            onChange={(type) => set(i, { type })}
            error={errors[`install.${i}.type`]}
            testID={`install-${i}-type`}
          />
          <TextField
            label="Details"
            placeholder="e.g. ported upper plenum, 70 mm throttle body"
            value={c.text}
            onChangeText={(text) => set(i, { text })}
            error={errors[`install.${i}.text`]}
            testID={`install-${i}-text`}
          />
          <Button label="Remove this change" kind="secondary" onPress={() => onChange(value.filter((_, j) => j !== i))} testID={`install-${i}-remove`} />
        </View>
      ))}
      <Button label="Add a change" kind="secondary" onPress={() => onChange([...value, { type: 'intake_manifold', text: '' }])} testID="install-add" />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  label: { ...type.label, color: colors.ink },
  hint: { ...type.small, color: colors.inkMuted },
  item: { gap: space.sm, padding: space.md, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface },
});
