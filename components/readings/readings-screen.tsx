import { StyleSheet, View, useWindowDimensions } from 'react-native';
import type { ReadingsCheckResult } from '@/shared/readings/readings-check';
import { formatNumber } from '@/shared/readings/errors';
import { pressureFromKpa, roundPressure } from '@/shared/readings/units';
import { VERDICT_LABELS } from '@/shared/readings/verdict-labels';
import { useReadingsCheck } from '@/hooks/use-readings';
import { Screen } from '@/components/screen';
import { ThemedText } from '@/components/themed-text';
import { Notice } from '@/components/notice';
import { Button } from '@/components/button';
import { colors, radius, space, wideBreakpoint } from '@/components/theme';
import { useReadingsForm } from './use-readings-form';
import { AirAndEngineFields, VacuumFields } from './air-engine-fields';
import { TrimsFields } from './trims-fields';
import { VacuumResult } from './vacuum-result';
import { TrimsResult } from './trims-result';

/** The Readings screen: the calculator on its own, judging as the technician types. */
export function ReadingsScreen() {
  const form = useReadingsForm();
  const wide = useWindowDimensions().width >= wideBreakpoint;
  const server = useReadingsCheck();
  const errorCount = Object.keys(form.errors).length;
  const result = form.result;
  const status = (
    <>
      {!form.hasReading && errorCount === 0 ? (
        <Notice tone="info" title="Nothing to judge yet" testID="readings-empty">
          Type an idle vacuum or MAP reading, or short and long term trims for a bank; the verdict appears beside them.
        </Notice>
      ) : null}
      {errorCount > 0 ? (
        <Notice tone="error" title="Check the marked fields" testID="readings-errors">
          {`${errorCount === 1 ? 'One value' : `${errorCount} values`} cannot be right; the message beside each field says what is allowed.`}
        </Notice>
      ) : null}
    </>
  );
  const vacuumResult = result?.vacuum ? <VacuumResult j={result.vacuum} /> : null;
  const trimsResult = result?.trims ? <TrimsResult j={result.trims} /> : null;
  const serverCheck = form.hasReading && errorCount === 0 ? <ServerCheck server={server} input={form.input} local={result} /> : null;

  return (
    <Screen testID="readings-screen">
      <ThemedText variant="title" accessibilityRole="header">
        Readings
      </ThemedText>
      <ThemedText muted>Idle vacuum or MAP and fuel trims, judged for this engine at this altitude as you type.</ThemedText>
      {wide ? (
        <View style={[styles.columns, styles.columnsWide]}>
          <View style={[styles.col, styles.half]} testID="readings-form">
            <WhereSection form={form} />
            <VacuumSection form={form} />
            <TrimsSection form={form} />
          </View>
          <View style={[styles.col, styles.half]} testID="readings-results" accessibilityLiveRegion="polite">
            {status}
            {vacuumResult}
            {trimsResult}
            {serverCheck}
          </View>
        </View>
      ) : (
        // On a phone each verdict sits right under the fields it judges, so it shows while typing.
        <View style={styles.col} testID="readings-form">
          <WhereSection form={form} />
          <VacuumSection form={form} />
          {vacuumResult}
          <TrimsSection form={form} />
          {trimsResult}
          <View style={styles.col} testID="readings-results" accessibilityLiveRegion="polite">
            {status}
            {serverCheck}
          </View>
        </View>
      )}
    </Screen>
  );
}

type Form = ReturnType<typeof useReadingsForm>;

function WhereSection({ form }: { form: Form }) {
  return (
    <Section title="Where and what engine">
      <AirAndEngineFields form={form} />
      {form.result ? <BaroLine baro={form.result.baro} unit={form.state.vacuumUnit} /> : null}
    </Section>
  );
}

function VacuumSection({ form }: { form: Form }) {
  return (
    <Section title="Idle vacuum">
      <VacuumFields form={form} />
    </Section>
  );
}

function TrimsSection({ form }: { form: Form }) {
  return (
    <Section title="Fuel trims">
      <TrimsFields form={form} />
    </Section>
  );
}

function Section({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <View style={styles.section}>
      <ThemedText variant="heading" accessibilityRole="header">
        {title}
      </ThemedText>
      {children}
    </View>
  );
}

function BaroLine({ baro, unit }: { baro: ReadingsCheckResult['baro']; unit: Parameters<typeof pressureFromKpa>[1] }) {
  const inUnit = unit === 'kPa' ? '' : ` (${formatNumber(roundPressure(pressureFromKpa(baro.kPa, unit), unit), 3)} ${unit})`;
  const where =
    baro.source === 'measured'
      ? baro.altitudeM !== undefined
        ? `measured; the standard atmosphere puts that at about ${formatNumber(baro.altitudeM, 0)} m`
        : 'measured'
      : baro.source === 'altitude'
        ? `standard atmosphere at ${formatNumber(baro.altitudeM ?? 0, 0)} m`
        : 'standard sea level';
  return (
    <ThemedText variant="small" muted testID="baro-line">
      {`Air pressure used: ${formatNumber(baro.kPa, 1)} kPa${inUnit}, ${where}.`}
    </ThemedText>
  );
}

/** Runs the same check on the server (the authoritative copy a saved walk will use) and says whether it agrees. */
function ServerCheck({ server, input, local }: { server: ReturnType<typeof useReadingsCheck>; input: ReturnType<typeof useReadingsForm>['input']; local?: ReadingsCheckResult }) {
  const answer = server.data;
  const agrees = answer && local && answer.vacuum?.verdict === local.vacuum?.verdict && answer.trims?.verdict === local.trims?.verdict;
  return (
    <View style={styles.col}>
      <Button label="Check on the server" kind="secondary" onPress={() => server.mutate(input)} busy={server.isPending} testID="server-check" />
      {server.isError ? (
        <Notice tone="error" title="The server refused these readings" testID="server-error">
          {[server.error.message, ...Object.values((server.error as { fields?: Record<string, string> }).fields ?? {})].filter((m, i, a) => a.indexOf(m) === i).join(' ')}
        </Notice>
      ) : null}
      {answer ? (
        <Notice tone={agrees ? 'ok' : 'info'} title={agrees ? 'The server agrees' : 'The server answered'} testID="server-answer">
          {[answer.vacuum && `Idle vacuum: ${VERDICT_LABELS[answer.vacuum.verdict]}.`, answer.trims && `Fuel trims: ${VERDICT_LABELS[answer.trims.verdict]}.`, agrees ? '' : 'The readings changed since; check again.']
            .filter(Boolean)
            .join(' ')}
        </Notice>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  columns: { gap: space.xl },
  columnsWide: { flexDirection: 'row', alignItems: 'flex-start' },
  col: { gap: space.lg },
  half: { flex: 1, minWidth: 0 },
  section: { gap: space.md, backgroundColor: colors.paper, borderRadius: radius.md },
});
