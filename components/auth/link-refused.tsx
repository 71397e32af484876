import { StyleSheet, View } from 'react-native';
import type { Href } from 'expo-router';
import { Notice } from '@/components/notice';
import { space } from '@/components/theme';
import { AuthHeading, AuthLinks } from './auth-links';

/** An e-mailed link (invitation, password reset) that cannot be used: why, and where to go instead. */
export function LinkRefused({ heading, title, error, links, testID }: { heading: string; title: string; error?: Error | null; links: Array<{ href: Href; label: string }>; testID: string }) {
  return (
    <View style={styles.col} testID={testID}>
      <AuthHeading title={heading} />
      <Notice tone="error" title={title}>
        {error?.message ?? 'The link is missing its code. Open the link from the e-mail again.'}
      </Notice>
      <AuthLinks links={links} />
    </View>
  );
}

const styles = StyleSheet.create({ col: { gap: space.lg } });
