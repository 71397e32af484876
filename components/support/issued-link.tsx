import { useState } from 'react';
import { Platform, StyleSheet, Text, View } from 'react-native';
import type { GuestLinkIssued } from '@/shared/schemas/guest-links';
import { Notice } from '@/components/notice';
import { Button } from '@/components/button';
import { colors, fonts, radius, space } from '@/components/theme';

/** Copies text on the web; false when the browser does not allow it (the address is still shown to select). */
async function copyText(text: string): Promise<boolean> {
  if (Platform.OS !== 'web' || !globalThis.navigator?.clipboard) return false;
  try {
    await navigator.clipboard.writeText(text);
    return true;
  } catch {
    return false;
  }
}

/** A link just made: e-mailed or not, and its address to copy. Shown once: only a hash of it is kept. */
export function IssuedLink({ issued }: { issued: GuestLinkIssued }) {
  const [copied, setCopied] = useState<boolean | undefined>();
  return (
    <View style={styles.wrap} testID="issued-link">
      {issued.mailed ? (
        <Notice tone="ok" title="Link e-mailed" testID="issued-mailed">
          {`Sent to ${issued.link.customerEmail}. It works until ${new Date(issued.link.expiresAt).toLocaleDateString()}.`}
        </Notice>
      ) : (
        <Notice tone="info" title="Link ready to copy">
          Send it to the customer by text or chat. It is shown only now: the shop keeps no copy of it.
        </Notice>
      )}
      <Text selectable style={styles.url} testID="issued-url">
        {issued.url}
      </Text>
      <View style={styles.row}>
        <Button label={copied ? '✔ Copied' : 'Copy link'} kind="secondary" onPress={() => void copyText(issued.url).then(setCopied)} testID="issued-copy" />
      </View>
      {copied === false ? <Text style={styles.hint}>This browser did not allow copying: select the address above and copy it.</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  url: { fontFamily: fonts.semibold, fontSize: 15, color: colors.ink, backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line, borderRadius: radius.md, padding: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  hint: { fontFamily: fonts.regular, fontSize: 14, color: colors.inkMuted },
});
