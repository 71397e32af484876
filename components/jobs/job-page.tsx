import { ActivityIndicator, StyleSheet, Text, View, useWindowDimensions } from 'react-native';
import { router } from 'expo-router';
import { INSTALL_TYPE_LABELS } from '@/trees/tree-format';
import { checkVin } from '@/shared/vin';
import { useJob } from '@/hooks/use-jobs';
import { Screen } from '@/components/screen';
import { ThemedText } from '@/components/themed-text';
import { Notice } from '@/components/notice';
import { Button } from '@/components/button';
import { colors, fonts, radius, space, type, wideBreakpoint } from '@/components/theme';
import { vehicleLine } from './job-vehicle';
import { JobWalks } from './job-walks';
import { TreePicker } from './tree-picker';

/** One job: the vehicle and install, its walks, and a picker to start a new walk. */
export function JobPage({ id }: { id: number }) {
  const job = useJob(id);
  const { width } = useWindowDimensions();
  const wide = width >= wideBreakpoint;
  if (job.isPending) {
    return (
      <Screen>
        <ActivityIndicator color={colors.accent} />
      </Screen>
    );
  }
  if (job.isError) {
    return (
      <Screen>
        <Notice tone="error" title="Could not open the job">{job.error.message}</Notice>
        <Button label="Back to jobs" kind="secondary" onPress={() => router.replace('/jobs')} />
      </Screen>
    );
  }
  const j = job.data;
  const vin = j.vin ? checkVin(j.vin) : null;
  const details = (
    <View style={styles.card} testID="job-details">
      <Field label="Customer" value={j.customerName} />
      <Field label="Vehicle" value={vehicleLine(j)} />
      <Field label="VIN" value={j.vin ? `${j.vin}${vin?.status === 'valid' ? ' (check digit correct)' : j.vinOverride ? ' (kept as typed: check digit does not match)' : ''}` : 'Not recorded'} />
      <Field label="Mileage" value={j.mileage !== null ? j.mileage.toLocaleString() : 'Not recorded'} />
      <Field label="Install" value={j.install.length ? j.install.map((c) => (c.text ? `${INSTALL_TYPE_LABELS[c.type]}: ${c.text}` : INSTALL_TYPE_LABELS[c.type])).join('\n') : 'Not recorded'} />
      {j.notes ? <Field label="Notes" value={j.notes} /> : null}
      <Button label="Edit job" kind="secondary" onPress={() => router.push(`/jobs/${j.id}/edit`)} testID="job-edit" />
    </View>
  );
  return (
    <Screen testID="job-page">
      <View>
        <Button label="‹ All jobs" kind="secondary" onPress={() => router.push('/jobs')} testID="back-to-jobs" />
      </View>
      <ThemedText variant="title" accessibilityRole="header">
        RO {j.roNumber}
      </ThemedText>
      <View style={[styles.columns, wide && styles.columnsWide]}>
        <View style={styles.column}>
          {details}
          <ThemedText variant="heading" accessibilityRole="header">
            Walks
          </ThemedText>
          <JobWalks jobId={j.id} />
        </View>
        <View style={styles.column}>
          <ThemedText variant="heading" accessibilityRole="header">
            Start a walk
          </ThemedText>
          <ThemedText muted>Pick the tree for the symptom the car came back with.</ThemedText>
          <TreePicker job={j} />
        </View>
      </View>
    </Screen>
  );
}

function Field({ label, value }: { label: string; value: string }) {
  return (
    <View style={styles.field}>
      <Text style={styles.label}>{label}</Text>
      <Text style={styles.value}>{value}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  columns: { gap: space.xl },
  columnsWide: { flexDirection: 'row', alignItems: 'flex-start' },
  column: { flex: 1, gap: space.md, minWidth: 0 },
  card: { backgroundColor: colors.surface, borderRadius: radius.lg, borderWidth: 1, borderColor: colors.line, padding: space.lg, gap: space.md },
  field: { gap: 2 },
  label: { ...type.label, color: colors.inkMuted },
  value: { ...type.body, color: colors.ink, fontFamily: fonts.regular },
});
