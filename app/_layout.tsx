import { useState } from 'react';
import { ActivityIndicator, View } from 'react-native';
import { Slot } from 'expo-router';
import { useFonts } from 'expo-font';
import { QueryClientProvider } from '@tanstack/react-query';
import { createQueryClient } from '@/hooks/query-client';
import { colors, fonts } from '@/components/theme';

/** Root layout: shipped fonts and the query client for every screen. */
export default function RootLayout() {
  const [queryClient] = useState(createQueryClient);
  const [loaded, error] = useFonts({
    [fonts.regular]: require('@/assets/fonts/NunitoSans_400Regular.ttf'),
    [fonts.semibold]: require('@/assets/fonts/NunitoSans_600SemiBold.ttf'),
    [fonts.bold]: require('@/assets/fonts/NunitoSans_700Bold.ttf'),
  });

  if (!loaded && !error) {
    return (
      <View style={{ flex: 1, alignItems: 'center', justifyContent: 'center', backgroundColor: colors.paper }}>
        <ActivityIndicator color={colors.accent} />
      </View>
    );
  }
  return (
    <QueryClientProvider client={queryClient}>
      <Slot />
    </QueryClientProvider>
  );
}
