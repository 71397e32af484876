import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { Notice } from '@/components/notice';
import { space } from '@/components/theme';

/** The bottom of a form: a message for the whole form (if any) above its buttons. */
export function FormActions({ formError, errorTitle, children, testID }: { formError?: string; errorTitle?: string; children: ReactNode; testID?: string }) {
  return (
    <View style={styles.wrap}>
      {formError ? (
        <Notice tone="error" title={errorTitle} testID={testID ? `${testID}-error` : 'form-error'}>
          {formError}
        </Notice>
      ) : null}
      <View style={styles.buttons}>{children}</View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
