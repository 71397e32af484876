import { StyleSheet, View } from 'react-native';
import { TextField } from '@/components/forms/text-field';
import { SegmentedChoice } from '@/components/forms/segmented-choice';
import { ThemedText } from '@/components/themed-text';
import { colors, radius, space } from '@/components/theme';
import type { BankKey, SpeedKey } from './readings-form-state';
import type { useReadingsForm } from './use-readings-form';

type Form = ReturnType<typeof useReadingsForm>;

const SPEEDS: Array<[SpeedKey, string]> = [
  ['idle', 'At idle'],
  ['at2500', 'At about 2 500 rpm'],
];

/** Short and long term trims per bank at idle and about 2 500 rpm, in percent as the scan tool shows them. */
export function TrimsFields({ form }: { form: Form }) {
  const { state: s, update, setTrim, errors } = form;
  const banks: BankKey[] = s.twoBanks ? ['bank1', 'bank2'] : ['bank1'];
  return (
    <View style={styles.col}>
      <SegmentedChoice
        label="Banks"
        hint="A V engine has two banks; an inline engine has one."
        options={[
          { value: 'one', label: 'One bank' },
          { value: 'two', label: 'Two banks' },
        ]}
        value={s.twoBanks ? 'two' : 'one'}
        onChange={(v) => update({ twoBanks: v === 'two' })}
        testID="banks"
      />
      {banks.map((bank) => (
        <View key={bank} style={styles.bank} testID={`trims-${bank}`}>
          <ThemedText variant="subheading">{bank === 'bank1' ? 'Bank 1' : 'Bank 2'}</ThemedText>
          {SPEEDS.map(([speed, label]) => {
            const base = `trims.${bank}.${speed}`;
            return (
              <View key={speed} style={styles.speed}>
                <ThemedText variant="label">{label}</ThemedText>
                <View style={styles.pair}>
                  <View style={styles.half}>
                    <TextField
                      label="Short term %"
                      value={s.trims[bank][speed].shortText}
                      onChangeText={(t) => setTrim(bank, speed, 'shortText', t)}
                      error={errors[`${base}.shortPct`]}
                      keyboardType="numbers-and-punctuation"
                      autoCorrect={false}
                      testID={`${bank}-${speed}-short`}
                    />
                  </View>
                  <View style={styles.half}>
                    <TextField
                      label="Long term %"
                      value={s.trims[bank][speed].longText}
                      onChangeText={(t) => setTrim(bank, speed, 'longText', t)}
                      error={errors[`${base}.longPct`]}
                      keyboardType="numbers-and-punctuation"
                      autoCorrect={false}
                      testID={`${bank}-${speed}-long`}
                    />
                  </View>
                </View>
              </View>
            );
          })}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  col: { gap: space.lg },
  bank: { gap: space.md, borderWidth: 1, borderColor: colors.line, borderRadius: radius.md, padding: space.md, backgroundColor: colors.surface },
  speed: { gap: space.xs },
  pair: { flexDirection: 'row', gap: space.sm },
  half: { flex: 1 },
});
