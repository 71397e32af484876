import { useState } from 'react';
import { ActivityIndicator, View } from 'react-native';
import { Slot } from 'expo-router';
import { QueryClientProvider } from '@tanstack/react-query';
import { createQueryClient } from '@/hooks/query-client';
import { useAppFonts } from '@/hooks/use-app-fonts';
import { SessionGate } from '@/components/auth/session-gate';
import { colors } from '@/components/theme';

/**
 * Root layout: shipped fonts, the query client, and the sign-in gate, declared
 * here once for every screen: `(app)` screens need a session, `(auth)` screens
 * are for signing in (rules in components/auth/gate-rules.ts).
 */
export default function RootLayout() {
  const [queryClient] = useState(createQueryClient);
  const fontsReady = useAppFonts();

  if (!fontsReady) {
    return (
      <View style={{ flex: 1, alignItems: 'center', justifyContent: 'center', backgroundColor: colors.paper }}>
        <ActivityIndicator color={colors.accent} />
      </View>
    );
  }
  return (
    <QueryClientProvider client={queryClient}>
      <SessionGate>
        <Slot />
      </SessionGate>
    </QueryClientProvider>
  );
}
