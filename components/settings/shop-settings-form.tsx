import { useState } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { PRESSURE_UNITS, type PressureUnit } from '@/shared/readings/reading-kinds';
import { shopSettingsSchema, type Shop } from '@/shared/schemas/shop';
import { useShop, useUpdateShop } from '@/hooks/use-shop';
import { Button } from '@/components/button';
import { Notice } from '@/components/notice';
import { Screen } from '@/components/screen';
import { ThemedText } from '@/components/themed-text';
import { TextField } from '@/components/forms/text-field';
import { SegmentedChoice } from '@/components/forms/segmented-choice';
import { FormActions } from '@/components/forms/form-actions';
import { useZodForm } from '@/components/forms/use-zod-form';
import { colors, radius, space } from '@/components/theme';
import { feetToMetres, metresToFeet } from './format';
import { SettingsNav } from './settings-nav';

type AltitudeUnit = 'm' | 'ft';
const UNIT_LABELS: Record<PressureUnit, string> = { kPa: 'kPa', Pa: 'Pa', inHg: 'inHg', psi: 'psi', mmHg: 'mmHg', inH2O: 'inH₂O', bar: 'bar' };
const PRESSURE_CHOICES = PRESSURE_UNITS.map((u) => ({ value: u, label: UNIT_LABELS[u] }));
const ALTITUDE_CHOICES = [
  { value: 'm' as const, label: 'Metres' },
  { value: 'ft' as const, label: 'Feet' },
];

/** A number typed in a field, or undefined (so the schema says "enter a number"). */
const numberOrUndefined = (text: string) => (text.trim() === '' || Number.isNaN(Number(text)) ? undefined : Number(text));

/** Settings → Shop (owner): loads the settings, then the form. */
export function ShopSettingsScreen() {
  const shop = useShop();
  return (
    <Screen testID="shop-settings-screen">
      <SettingsNav current="shop" />
      <ThemedText variant="title" accessibilityRole="header">
        Shop
      </ThemedText>
      {shop.isPending ? <ActivityIndicator color={colors.accent} /> : null}
      {shop.isError ? <Notice tone="error" title="Settings not loaded">{shop.error.message}</Notice> : null}
      {shop.data ? <ShopSettingsForm key={shop.data.id} shop={shop.data} /> : null}
    </Screen>
  );
}

function ShopSettingsForm({ shop }: { shop: Shop }) {
  const update = useUpdateShop();
  const [saved, setSaved] = useState(false);
  const form = useZodForm(
    shopSettingsSchema,
    {
      name: shop.name,
      altitude: String(shop.altitudeM),
      altitudeUnit: 'm' as AltitudeUnit,
      pressureUnit: shop.pressureUnit as PressureUnit,
      comebackWindowDays: String(shop.comebackWindowDays),
    },
    (v) => {
      const altitude = numberOrUndefined(v.altitude);
      return {
        name: v.name,
        altitudeM: altitude === undefined || v.altitudeUnit === 'm' ? altitude : feetToMetres(altitude),
        pressureUnit: v.pressureUnit,
        comebackWindowDays: numberOrUndefined(v.comebackWindowDays),
      };
    },
  );
  const set = <K extends keyof typeof form.values>(key: K, value: (typeof form.values)[K]) => {
    setSaved(false);
    form.setValue(key, value);
  };
  const switchAltitudeUnit = (unit: AltitudeUnit) => {
    const n = numberOrUndefined(form.values.altitude);
    if (n !== undefined && unit !== form.values.altitudeUnit) set('altitude', String(unit === 'ft' ? metresToFeet(n) : feetToMetres(n)));
    set('altitudeUnit', unit);
  };
  const submit = () => {
    const input = form.validate();
    if (input) update.mutate(input, { onError: form.showError, onSuccess: () => setSaved(true) });
  };

  return (
    <View style={styles.box} testID="shop-settings-form">
      <TextField label="Shop name" value={form.values.name} onChangeText={(v) => set('name', v)} error={form.errors.name} testID="shop-name" />
      <View style={styles.pair}>
        <View style={styles.grow}>
          <TextField
            label={`Altitude (${form.values.altitudeUnit === 'm' ? 'metres' : 'feet'} above sea level)`}
            hint="Expected idle vacuum depends on it; readings use it as the default."
            value={form.values.altitude}
            onChangeText={(v) => set('altitude', v)}
            error={form.errors.altitudeM}
            inputMode="numeric"
            testID="shop-altitude"
          />
        </View>
        <SegmentedChoice label="Altitude in" options={ALTITUDE_CHOICES} value={form.values.altitudeUnit} onChange={switchAltitudeUnit} testID="shop-altitude-unit" />
      </View>
      <SegmentedChoice
        label="Preferred pressure unit"
        hint="Vacuum and pressure readings start in this unit."
        options={PRESSURE_CHOICES}
        value={form.values.pressureUnit}
        onChange={(u) => set('pressureUnit', u)}
        error={form.errors.pressureUnit}
        testID="shop-pressure-unit"
      />
      <TextField
        label="Comeback window (days)"
        hint="A vehicle back with the same symptom within this many days of a fixed walk counts as a comeback."
        value={form.values.comebackWindowDays}
        onChangeText={(v) => set('comebackWindowDays', v)}
        error={form.errors.comebackWindowDays}
        inputMode="numeric"
        testID="shop-comeback"
      />
      {saved ? (
        <Notice tone="ok" title="Saved" testID="shop-saved">
          The shop settings are saved.
        </Notice>
      ) : null}
      <FormActions formError={form.formError} errorTitle="Not saved">
        <Button label="Save settings" onPress={submit} busy={update.isPending} testID="shop-save" />
      </FormActions>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { backgroundColor: colors.surface, borderRadius: radius.lg, borderWidth: 1, borderColor: colors.line, padding: space.lg, gap: space.lg },
  pair: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, alignItems: 'flex-start' },
  grow: { flexGrow: 1, flexBasis: 240 },
});
