import { StyleSheet, View } from 'react-native';
import { jobInputSchema } from '@/shared/schemas/jobs';
import type { GuestLink } from '@/shared/schemas/guest-links';
import { useGuestLinkToJob } from '@/hooks/use-guest-links';
import { useZodForm } from '@/components/forms/use-zod-form';
import { TextField } from '@/components/forms/text-field';
import { FormActions } from '@/components/forms/form-actions';
import { Button } from '@/components/button';
import { ThemedText } from '@/components/themed-text';
import { VinField } from '@/components/jobs/vin-field';
import { jobFormValues, toJobInput } from '@/components/jobs/job-form-values';
import { colors, radius, space } from '@/components/theme';

/** The customer brought the car in: a new job with the guest walk attached. The link page then shows the job (support has no job pages). */
export function JobFromWalk({ link, onCancel }: { link: GuestLink; onCancel: () => void }) {
  const toJob = useGuestLinkToJob(link.id);
  const form = useZodForm(jobInputSchema, { ...jobFormValues(), customerName: link.customerName, notes: link.note ?? '' }, toJobInput);
  const { values: v, setValue, errors } = form;

  const submit = async () => {
    if (!form.validate()) return;
    try {
      await toJob.mutateAsync(toJobInput(v));
    } catch (err) {
      form.showError(err);
    }
  };

  return (
    <View style={styles.box} testID="job-from-walk">
      <ThemedText variant="subheading">New job from this walk</ThemedText>
      <ThemedText muted>The walk becomes part of the job, so the technician sees what the customer found.</ThemedText>
      <TextField label="Repair-order number" value={v.roNumber} onChangeText={(t) => setValue('roNumber', t)} error={errors.roNumber} autoCapitalize="characters" testID="job-roNumber" />
      <TextField label="Customer name" value={v.customerName} onChangeText={(t) => setValue('customerName', t)} error={errors.customerName} testID="job-customerName" />
      <VinField value={v.vin} onChange={(t) => setValue('vin', t)} override={v.vinOverride} onOverride={(b) => setValue('vinOverride', b)} year={v.year} error={errors.vin} />
      <View style={styles.row}>
        <View style={styles.half}>
          <TextField label="Make" value={v.make} onChangeText={(t) => setValue('make', t)} error={errors.make} testID="job-make" />
        </View>
        <View style={styles.half}>
          <TextField label="Model" value={v.model} onChangeText={(t) => setValue('model', t)} error={errors.model} testID="job-model" />
        </View>
      </View>
      <FormActions formError={form.formError} testID="job-from-walk">
        <Button label="Create the job" onPress={() => void submit()} busy={toJob.isPending} testID="job-from-walk-submit" />
        <Button label="Cancel" kind="secondary" onPress={onCancel} />
      </FormActions>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.md, padding: space.lg, borderWidth: 1, borderColor: colors.line, borderRadius: radius.lg, backgroundColor: colors.surface },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  half: { flexGrow: 1, flexBasis: 220 },
});
