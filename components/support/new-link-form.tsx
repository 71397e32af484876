import { useRef, useState } from 'react';
import { ActivityIndicator, Pressable, StyleSheet, Text, View } from 'react-native';
import { router } from 'expo-router';
import { GUEST_LINK_DEFAULT_DAYS, guestLinkCreateSchema, type GuestLinkIssued } from '@/shared/schemas/guest-links';
import { useTrees } from '@/hooks/use-trees';
import { useCreateGuestLink } from '@/hooks/use-guest-links';
import { useZodForm } from '@/components/forms/use-zod-form';
import { TextField } from '@/components/forms/text-field';
import { SegmentedChoice } from '@/components/forms/segmented-choice';
import { FormActions } from '@/components/forms/form-actions';
import { Screen } from '@/components/screen';
import { ThemedText } from '@/components/themed-text';
import { Button } from '@/components/button';
import { colors, fonts, radius, space, touchTarget, type } from '@/components/theme';
import { IssuedLink } from './issued-link';

const DAYS = ['1', '3', '7', '14', '30'] as const;
type Values = { treeId: number; customerName: string; customerEmail: string; expiresInDays: (typeof DAYS)[number]; note: string };

/** Support's form to send a published tree to a customer: e-mail it, or create it and copy the address. */
export function NewLinkForm() {
  const trees = useTrees();
  const create = useCreateGuestLink();
  const [issued, setIssued] = useState<GuestLinkIssued>();
  // Which button was pressed: the schema needs it (an e-mail address is required only to send).
  const send = useRef(true);
  const toInput = (v: Values) => ({ ...v, treeId: v.treeId || undefined, expiresInDays: Number(v.expiresInDays), send: send.current });
  const form = useZodForm(guestLinkCreateSchema, { treeId: 0, customerName: '', customerEmail: '', expiresInDays: String(GUEST_LINK_DEFAULT_DAYS) as Values['expiresInDays'], note: '' } as Values, toInput);
  const { values: v, setValue, errors } = form;
  const published = (trees.data?.trees ?? []).filter((t) => t.status === 'active' && t.publishedVersion !== null);

  const submit = async (bySend: boolean) => {
    send.current = bySend;
    const parsed = form.validate();
    if (!parsed) return;
    try {
      setIssued(await create.mutateAsync(parsed));
    } catch (err) {
      form.showError(err);
    }
  };

  if (issued) {
    return (
      <Screen testID="new-link-done">
        <ThemedText variant="title" accessibilityRole="header">
          Link for {issued.link.customerName}
        </ThemedText>
        <IssuedLink issued={issued} />
        <View style={styles.row}>
          <Button label="Open the link's page" onPress={() => router.replace(`/support/${issued.link.id}`)} testID="new-link-open" />
          <Button label="Back to Support" kind="secondary" onPress={() => router.replace('/support')} />
        </View>
      </Screen>
    );
  }

  return (
    <Screen testID="new-link">
      <ThemedText variant="title" accessibilityRole="header">
        Send a guest link
      </ThemedText>
      <ThemedText muted>The customer walks the tree on their phone, with a safety notice first. The tree's published version is fixed for this link.</ThemedText>
      <View style={styles.field}>
        <Text style={styles.label}>Tree</Text>
        {trees.isPending ? <ActivityIndicator color={colors.accent} /> : null}
        <View accessibilityRole="radiogroup" accessibilityLabel="Tree" style={styles.trees} testID="link-trees">
          {published.map((t) => {
            const picked = v.treeId === t.id;
            return (
              <Pressable
                key={t.id}
                accessibilityRole="radio"
                aria-checked={picked}
                onPress={() => setValue('treeId', t.id)}
                testID={`link-tree-${t.slug}`}
                style={[styles.tree, picked && styles.treePicked]}
              >
                <Text style={[styles.treeTitle, picked && styles.treeTitlePicked]}>
                  {picked ? '✓ ' : ''}
                  {t.title}
                </Text>
                <Text style={styles.treeMeta}>Version {t.publishedVersion} · {t.steps} steps</Text>
              </Pressable>
            );
          })}
        </View>
        {errors.treeId ? <Text style={styles.error}>✖ {errors.treeId}</Text> : null}
      </View>
      <TextField label="Customer name" value={v.customerName} onChangeText={(t) => setValue('customerName', t)} error={errors.customerName} autoComplete="off" testID="link-customer-name" />
      <TextField
        label="Customer e-mail (optional)"
        hint="Needed to e-mail the link; without it, copy the link and send it yourself."
        value={v.customerEmail}
        onChangeText={(t) => setValue('customerEmail', t)}
        error={errors.customerEmail}
        keyboardType="email-address"
        autoCapitalize="none"
        autoComplete="off"
        testID="link-customer-email"
      />
      <SegmentedChoice
        label="Link works for"
        options={DAYS.map((d) => ({ value: d, label: `${d} day${d === '1' ? '' : 's'}` }))}
        value={v.expiresInDays}
        onChange={(d) => setValue('expiresInDays', d)}
        error={errors.expiresInDays}
        testID="link-days"
      />
      <TextField label="Internal note (the customer never sees it)" value={v.note} onChangeText={(t) => setValue('note', t)} error={errors.note} multiline numberOfLines={3} testID="link-note" />
      <FormActions formError={form.formError} testID="link-form">
        <Button label="Create and e-mail" onPress={() => void submit(true)} busy={create.isPending && send.current} disabled={create.isPending} testID="link-send" />
        <Button label="Create and copy" kind="secondary" onPress={() => void submit(false)} busy={create.isPending && !send.current} disabled={create.isPending} testID="link-copy" />
      </FormActions>
    </Screen>
  );
}

const styles = StyleSheet.create({
  field: { gap: space.xs },
  label: { ...type.label, color: colors.ink },
  trees: { gap: space.sm },
  tree: { minHeight: touchTarget, borderWidth: 2, borderColor: colors.line, borderRadius: radius.md, backgroundColor: colors.surface, padding: space.md, gap: 2 },
  treePicked: { borderColor: colors.accent, backgroundColor: colors.accentSoft },
  treeTitle: { fontFamily: fonts.semibold, fontSize: 16, color: colors.ink },
  treeTitlePicked: { fontFamily: fonts.bold, color: colors.accentDark },
  treeMeta: { ...type.small, color: colors.inkMuted },
  error: { ...type.small, fontFamily: fonts.semibold, color: colors.danger },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
