import { StyleSheet, View } from 'react-native';
import { router } from 'expo-router';
import { jobInputSchema, type Job } from '@/shared/schemas/jobs';
import { useCreateJob, useUpdateJob } from '@/hooks/use-jobs';
import { useZodForm } from '@/components/forms/use-zod-form';
import { TextField } from '@/components/forms/text-field';
import { FormActions } from '@/components/forms/form-actions';
import { Button } from '@/components/button';
import { space } from '@/components/theme';
import { VinField } from './vin-field';
import { InstallEditor } from './install-editor';
import { jobFormValues, toJobInput, type JobFormValues } from './job-form-values';

/** Create or edit a job; checked with the same schema as the server. */
export function JobForm({ job }: { job?: Job }) {
  const form = useZodForm(jobInputSchema, jobFormValues(job), toJobInput);
  const create = useCreateJob();
  const update = useUpdateJob(job?.id ?? 0);
  const saving = create.isPending || update.isPending;
  const { values: v, setValue, errors } = form;

  const submit = async () => {
    const parsed = form.validate();
    if (!parsed) return;
    try {
      const input = toJobInput(v);
      const saved = job ? await update.mutateAsync(input) : await create.mutateAsync(input);
      router.replace(`/jobs/${saved.job.id}`);
    } catch (err) {
      form.showError(err);
    }
  };

  // In a row, basis 280 px puts two fields side by side when wide and stacks them on a phone.
  // Alone in the column it must not be set: a basis there is a height.
  const text = (key: keyof JobFormValues, label: string, extra: Partial<Parameters<typeof TextField>[0]> = {}, inRow = true) => (
    <View style={inRow ? styles.half : undefined}>
      <TextField label={label} value={v[key] as string} onChangeText={(t) => setValue(key, t as never)} error={errors[key as string]} testID={`job-${String(key)}`} {...extra} />
    </View>
  );

  return (
    <View style={styles.form} testID="job-form">
      <View style={styles.row}>
        {text('roNumber', 'Repair-order number', { autoCapitalize: 'characters', autoCorrect: false })}
        {text('customerName', 'Customer name', { autoComplete: 'off' })}
      </View>
      <VinField
        value={v.vin}
        onChange={(t) => setValue('vin', t)}
        override={v.vinOverride}
        onOverride={(b) => setValue('vinOverride', b)}
        year={v.year}
        error={errors.vin}
      />
      <View style={styles.row}>
        {text('year', 'Model year', { keyboardType: 'number-pad', hint: 'Left blank, the year from the VIN is used.', maxLength: 4 })}
        {text('mileage', 'Mileage', { keyboardType: 'number-pad' })}
      </View>
      <View style={styles.row}>
        {text('make', 'Make')}
        {text('model', 'Model')}
      </View>
      {text('engine', 'Engine', { placeholder: 'e.g. 5.3 V8, LS-swap' }, false)}
      <InstallEditor value={v.install} onChange={(install) => setValue('install', install)} errors={errors} />
      {text('notes', 'Notes', { multiline: true, numberOfLines: 4, placeholder: 'What the customer reports, what was done before' }, false)}
      <FormActions formError={form.formError} testID="job-form">
        <Button label={job ? 'Save changes' : 'Create job'} onPress={() => void submit()} busy={saving} testID="job-save" />
        <Button label="Cancel" kind="secondary" onPress={() => (router.canGoBack() ? router.back() : router.replace(job ? `/jobs/${job.id}` : '/jobs'))} testID="job-cancel" />
      </FormActions>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  half: { flexGrow: 1, flexBasis: 280 },
});
