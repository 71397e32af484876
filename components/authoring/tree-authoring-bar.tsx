import { useState } from 'react';
import { Platform, Pressable, StyleSheet, Text, View } from 'react-native';
import { Link, useRouter } from 'expo-router';
import { AUTHORS } from '@/shared/roles';
import type { TreeDetail } from '@/shared/schemas/trees';
import { useMe } from '@/hooks/use-session';
import { exportUrl, useStartDraft, useTreeStatus } from '@/hooks/use-tree-drafts';
import { Button } from '@/components/button';
import { Notice } from '@/components/notice';
import { colors, fonts, radius, space, touchTarget, type } from '@/components/theme';

/** The tree page's authoring tools: draft, history, export, retire or bring back. Authors see the writing tools. */
export function TreeAuthoringBar({ detail }: { detail: TreeDetail }) {
  const me = useMe();
  const router = useRouter();
  const author = !!me && AUTHORS.includes(me.role);
  const { tree } = detail;
  const draft = detail.versions.find((v) => v.state === 'draft');
  const start = useStartDraft(tree.id);
  const status = useTreeStatus(tree.id);
  const [confirmRetire, setConfirmRetire] = useState(false);
  const retired = tree.status === 'retired';

  return (
    <View style={styles.col} testID="tree-authoring">
      {retired ? (
        <Notice tone="caution" title="Retired" testID="tree-retired">
          This tree is no longer offered when starting a walk. Its versions and past walks are kept.
        </Notice>
      ) : null}
      <View style={styles.row}>
        {author && draft ? (
          <LinkButton href={`/trees/${tree.id}/edit`} label={`Continue the draft (version ${draft.version})`} primary testID="edit-draft" />
        ) : null}
        {author && !draft ? (
          <Button
            label="Start a new draft"
            onPress={() => start.mutate(undefined, { onSuccess: () => router.push(`/trees/${tree.id}/edit`) })}
            busy={start.isPending}
            testID="start-draft"
          />
        ) : null}
        <LinkButton href={`/trees/${tree.id}/history`} label="History and differences" testID="tree-history-link" />
        {Platform.OS === 'web' && tree.publishedVersion ? <ExportLink treeId={tree.id} /> : null}
        {author && !retired && tree.publishedVersion ? <Button label="Retire…" kind="secondary" onPress={() => setConfirmRetire(true)} testID="retire-tree" /> : null}
        {author && retired ? <Button label="Bring it back" kind="secondary" onPress={() => status.mutate('active')} busy={status.isPending} testID="restore-tree" /> : null}
      </View>
      {start.error ? <Notice tone="error">{start.error.message}</Notice> : null}
      {status.error ? <Notice tone="error">{status.error.message}</Notice> : null}
      {confirmRetire ? (
        <Notice tone="caution" title="Retire this tree?">
          <View style={styles.col}>
            <Text style={styles.text}>It leaves the start-a-walk picker. Walks already started finish on their version; history stays. You can bring it back later.</Text>
            <View style={styles.row}>
              <Button label="Retire the tree" kind="danger" busy={status.isPending} onPress={() => status.mutate('retired', { onSuccess: () => setConfirmRetire(false) })} testID="retire-confirm" />
              <Button label="Keep it" kind="secondary" onPress={() => setConfirmRetire(false)} />
            </View>
          </View>
        </Notice>
      ) : null}
    </View>
  );
}

function LinkButton({ href, label, primary, testID }: { href: string; label: string; primary?: boolean; testID?: string }) {
  return (
    <Link href={href as never} asChild>
      {/* A plain style object: Link's asChild drops style functions on web. */}
      <Pressable accessibilityRole="link" style={primary ? styles.primary : styles.secondary} testID={testID}>
        <Text style={primary ? styles.primaryText : styles.secondaryText}>{label}</Text>
      </Pressable>
    </Link>
  );
}

/** A download link for the published version as a Baywalk tree file (web). */
function ExportLink({ treeId }: { treeId: number }) {
  return (
    <a href={exportUrl(treeId)} download style={{ textDecoration: 'none' }} data-testid="export-tree">
      <View style={styles.secondary}>
        <Text style={styles.secondaryText}>⤓ Export as a file</Text>
      </View>
    </a>
  );
}

const base = { minHeight: touchTarget, paddingHorizontal: space.xl, borderRadius: radius.md, alignItems: 'center' as const, justifyContent: 'center' as const };
const styles = StyleSheet.create({
  col: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  text: { ...type.body, color: colors.ink },
  primary: { ...base, backgroundColor: colors.accent },
  primaryText: { fontFamily: fonts.bold, fontSize: 17, color: colors.onAccent },
  secondary: { ...base, backgroundColor: colors.surface, borderWidth: 2, borderColor: colors.accent },
  secondaryText: { fontFamily: fonts.bold, fontSize: 17, color: colors.accentDark },
});
