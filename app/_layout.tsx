// Root layout: fonts, safe areas and the query client around every route.
import { useState } from 'react';
import { Slot } from 'expo-router';
import { QueryClientProvider } from '@tanstack/react-query';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import { useAppFonts } from '@/hooks/use-app-fonts';
import { createQueryClient } from '@/hooks/query-client';
import { LoadingState } from '@/components/screen-states';
import { installFocusRing } from '@/components/focus-ring';

// Once, before the first screen: keyboard focus must show from the first Tab.
installFocusRing();

export { ErrorBoundary } from 'expo-router';

export default function RootLayout() {
  const [queryClient] = useState(createQueryClient);
  const fontsReady = useAppFonts();
  return (
    <SafeAreaProvider>
      <QueryClientProvider client={queryClient}>{fontsReady ? <Slot /> : <LoadingState label="Slackwater" />}</QueryClientProvider>
    </SafeAreaProvider>
  );
}
