import { StyleSheet, Text, View } from 'react-native';
import { checkVin } from '@/shared/vin';
import { TextField } from '@/components/forms/text-field';
import { Notice } from '@/components/notice';
import { colors, fonts, space, type } from '@/components/theme';
import { CheckboxRow } from './checkbox-row';

interface Props {
  value: string;
  onChange: (vin: string) => void;
  override: boolean;
  onOverride: (v: boolean) => void;
  /** The model year typed in the form, to warn when the VIN says otherwise. */
  year: string;
  error?: string;
}

/**
 * The VIN with its check digit (49 CFR 565) and model year worked out as it
 * is typed. A wrong check digit is a warning the tech can override for a
 * pre-1981 or non-North-American vehicle.
 */
export function VinField({ value, onChange, override, onOverride, year, error }: Props) {
  const check = checkVin(value);
  const decoded = check.modelYear?.year;
  const typedYear = Number(year);
  return (
    <View style={styles.wrap}>
      <TextField
        label="VIN"
        hint="17 characters, on the windscreen or the door pillar. Checked as you type."
        value={value}
        onChangeText={(t) => onChange(t.toUpperCase())}
        autoCapitalize="characters"
        autoCorrect={false}
        maxLength={24}
        error={error}
        testID="job-vin"
      />
      {check.status === 'valid' ? (
        <Text style={styles.ok} testID="vin-status-valid">
          ✔ {check.message}
        </Text>
      ) : check.status === 'incomplete' || check.status === 'empty' ? (
        <Text style={styles.muted} testID="vin-status-incomplete">
          {check.status === 'empty' ? 'No VIN yet: you can add it later.' : check.message}
        </Text>
      ) : (
        <View style={styles.warn}>
          <Notice tone="caution" title={check.status === 'bad_check_digit' ? 'Check digit does not match' : 'This does not look like a VIN'} testID="vin-status-warning">
            {check.message + (decoded ? ` If the VIN is right, position 10 says model year ${decoded}.` : '')}
          </Notice>
          <CheckboxRow
            label="Keep this VIN as typed: the vehicle is from before 1981 or was not built for North America"
            checked={override}
            onChange={onOverride}
            testID="vin-override"
          />
        </View>
      )}
      {decoded && year.trim() && Number.isInteger(typedYear) && typedYear !== decoded && check.status === 'valid' ? (
        <Notice tone="caution" title="Model year differs" testID="vin-year-mismatch">
          {`The VIN encodes model year ${decoded}, but the form says ${typedYear}.`}
        </Notice>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  ok: { ...type.small, fontFamily: fonts.semibold, color: colors.ok },
  muted: { ...type.small, color: colors.inkMuted },
  warn: { gap: space.sm },
});
