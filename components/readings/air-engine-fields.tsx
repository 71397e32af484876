import { StyleSheet, View } from 'react-native';
import { ENGINE_PROFILES, NEEDLE_BEHAVIOURS, PRESSURE_UNITS, type NeedleBehaviour } from '@/shared/readings/reading-kinds';
import { LENGTH_UNITS } from '@/shared/readings/units';
import { PROFILE_LABELS } from '@/shared/readings/vacuum';
import { TextField } from '@/components/forms/text-field';
import { SegmentedChoice } from '@/components/forms/segmented-choice';
import { space } from '@/components/theme';
import { UnitSelect } from './unit-select';
import type { useReadingsForm } from './use-readings-form';

type Form = ReturnType<typeof useReadingsForm>;

export const NEEDLE_LABELS: Record<NeedleBehaviour, string> = {
  steady: 'Steady',
  floating: 'Floating slowly',
  dropping_regularly: 'Dropping regularly',
  dropping_now_and_then: 'Dropping now and then',
  sinking_at_2500: 'Sinking at 2 500 rpm',
  fluttering: 'Fast flutter',
};

/** A number field with its unit picker on the same row. */
export function NumberWithUnit<T extends string>(props: {
  label: string;
  hint?: string;
  text: string;
  onText: (t: string) => void;
  unit: T;
  units: readonly T[];
  onUnit: (u: T) => void;
  error?: string;
  testID: string;
  signed?: boolean;
}) {
  return (
    <View style={styles.row}>
      <View style={styles.grow}>
        <TextField
          label={props.label}
          hint={props.hint}
          value={props.text}
          onChangeText={props.onText}
          error={props.error}
          keyboardType={props.signed ? 'numbers-and-punctuation' : 'decimal-pad'}
          inputMode={props.signed ? 'text' : 'decimal'}
          autoCorrect={false}
          testID={props.testID}
        />
      </View>
      <View style={styles.unit}>
        <UnitSelect label={`${props.label} unit`} value={props.unit} options={props.units} onChange={props.onUnit} testID={`${props.testID}-unit`} />
      </View>
    </View>
  );
}

/** Where the engine is (altitude or a measured barometer) and which camshaft it has. */
export function AirAndEngineFields({ form }: { form: Form }) {
  const { state: s, update, errors } = form;
  return (
    <View style={styles.col}>
      <SegmentedChoice
        label="Air pressure from"
        options={[
          { value: 'altitude', label: 'Altitude' },
          { value: 'baro', label: 'Measured barometer' },
        ]}
        value={s.airSource}
        onChange={(airSource) => update({ airSource })}
        testID="air-source"
      />
      {s.airSource === 'altitude' ? (
        <NumberWithUnit
          label="Altitude"
          hint={form.shopDefaultsLoaded ? `From the shop settings${form.shopName ? ` of ${form.shopName}` : ''}; change it if the car is elsewhere.` : 'Sea level until the shop settings load.'}
          text={s.altitudeText}
          onText={(altitudeText) => update({ altitudeText })}
          unit={s.altitudeUnit}
          units={LENGTH_UNITS}
          onUnit={(altitudeUnit) => update({ altitudeUnit })}
          error={errors.altitude}
          testID="altitude"
          signed
        />
      ) : (
        <NumberWithUnit
          label="Barometric pressure"
          hint="Absolute, as a scan tool shows it (PID 33), not corrected to sea level."
          text={s.baroText}
          onText={(baroText) => update({ baroText })}
          unit={s.baroUnit}
          units={PRESSURE_UNITS}
          onUnit={(baroUnit) => update({ baroUnit })}
          error={errors.baro}
          testID="baro"
        />
      )}
      <SegmentedChoice
        label="Engine"
        options={ENGINE_PROFILES.map((p) => ({ value: p, label: PROFILE_LABELS[p] }))}
        value={s.profile}
        onChange={(profile) => update({ profile })}
        error={errors.profile}
        testID="profile"
      />
    </View>
  );
}

/** The idle vacuum (gauge) or MAP (scan tool) reading and what the needle did. */
export function VacuumFields({ form }: { form: Form }) {
  const { state: s, update, errors } = form;
  const isMap = s.vacuumSource === 'map';
  return (
    <View style={styles.col}>
      <SegmentedChoice
        label="Idle reading from"
        options={[
          { value: 'vacuum', label: 'Vacuum gauge' },
          { value: 'map', label: 'Scan tool MAP' },
        ]}
        value={s.vacuumSource}
        onChange={(vacuumSource) => update({ vacuumSource })}
        testID="vacuum-source"
      />
      <NumberWithUnit
        label={isMap ? 'Manifold absolute pressure at idle' : 'Manifold vacuum at idle'}
        hint={isMap ? 'Engine warm, idling, no load.' : 'Engine warm, idling, no load; the gauge reading below the air pressure.'}
        text={s.vacuumText}
        onText={(vacuumText) => update({ vacuumText })}
        unit={s.vacuumUnit}
        units={PRESSURE_UNITS}
        onUnit={(vacuumUnit) => update({ vacuumUnit })}
        error={errors[s.vacuumSource]}
        testID="vacuum"
      />
      {!isMap ? (
        <SegmentedChoice
          label="The needle was"
          options={[{ value: 'none', label: 'Not noted' }, ...NEEDLE_BEHAVIOURS.map((n) => ({ value: n, label: NEEDLE_LABELS[n] }))]}
          value={s.needle ?? 'none'}
          onChange={(v) => update({ needle: v === 'none' ? undefined : (v as NeedleBehaviour) })}
          testID="needle"
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  col: { gap: space.lg },
  row: { flexDirection: 'row', alignItems: 'flex-start', gap: space.sm },
  grow: { flex: 1 },
  unit: { paddingTop: 24 },
});
