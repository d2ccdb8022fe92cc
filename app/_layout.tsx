import { useEffect, useRef, useState, type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import Head from 'expo-router/head';
import { PersistQueryClientProvider } from '@tanstack/react-query-persist-client';
import { Stack } from 'expo-router';
import { ApiError } from '@/lib/api/client';
import { SessionProvider } from '@/lib/session/session-provider';
import { HeaderAccount } from '@/components/ui/header-account';
import { HeaderBack } from '@/components/ui/app-header';
import { BottomBar } from '@/components/ui/bottom-bar';
import { ReadingQueueSync } from '@/components/jobs/reading-queue-sync';
import { useHeaderOptions } from '@/lib/theme/use-header-options';
import { useAppFonts } from '@/lib/theme/use-app-fonts';
import { AppStatus } from '@/components/offline/app-status';
import {
  PERSIST_MAX_AGE_MS,
  PERSIST_VERSION,
  devicePersister,
  saveWhenPageHides,
  shouldPersistQuery,
  startOnlineFromDevice,
} from '@/lib/offline/query-persist';
import { registerServiceWorker } from '@/lib/offline/service-worker';

export { ErrorBoundary } from 'expo-router';

function makeQueryClient() {
  return new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 60_000,
        // Kept (and on the device) as long as the persisted copy may be used offline.
        gcTime: PERSIST_MAX_AGE_MS,
        // 4xx answers will not change on retry; network and 5xx faults may.
        retry: (count, err) => !(err instanceof ApiError && err.status < 500) && count < 2,
      },
    },
  });
}

/** The query cache, restored from and saved to the device where it can be (not while rendering statically). */
function QueryProvider({ children }: { children: ReactNode }) {
  const [queryClient] = useState(makeQueryClient);
  const [persister] = useState(devicePersister);
  const stopSaving = useRef<(() => void) | null>(null);
  useEffect(() => () => stopSaving.current?.(), []);
  if (!persister) return <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>;
  return (
    <PersistQueryClientProvider
      client={queryClient}
      persistOptions={{
        persister,
        buster: PERSIST_VERSION,
        maxAge: PERSIST_MAX_AGE_MS,
        dehydrateOptions: { shouldDehydrateQuery: shouldPersistQuery },
      }}
      // What the device kept shows at once, but it may be older than its timestamp says (a change made
      // just before the reload may not have been written yet): every restored query counts as stale,
      // so the screens on view refetch when there is a connection and keep the kept copy when there is not.
      onSuccess={() => {
        void queryClient.invalidateQueries();
        stopSaving.current ??= saveWhenPageHides(queryClient, PERSIST_VERSION);
      }}
    >
      {children}
    </PersistQueryClientProvider>
  );
}

export default function RootLayout() {
  const fontsReady = useAppFonts();
  const header = useHeaderOptions();
  useEffect(() => {
    startOnlineFromDevice();
    registerServiceWorker();
  }, []);
  // Every page keeps a title (WCAG 2.4.2): Expo Router's head manager owns <title> once the app runs.
  const title = (
    <Head>
      <title>Specbench</title>
    </Head>
  );
  if (!fontsReady) return title;
  return (
    <QueryProvider>
      {title}
      <SessionProvider>
        <ReadingQueueSync />
        <AppStatus />
        <View style={styles.screens}>
          <Stack
            screenOptions={{
              ...header,
              headerLeft: () => <HeaderBack />,
              headerRight: () => <HeaderAccount />,
            }}
          >
            <Stack.Screen name="index" options={{ title: 'Specbench' }} />
            <Stack.Screen name="models/[modelId]" options={{ title: 'Model sheet' }} />
            <Stack.Screen name="specs/[specId]" options={{ title: 'Spec' }} />
            <Stack.Screen name="calculator" options={{ title: 'Calculator' }} />
            <Stack.Screen name="jobs/index" options={{ title: 'My jobs' }} />
            <Stack.Screen name="jobs/[jobId]" options={{ title: 'Job sheet' }} />
            <Stack.Screen name="jobs/[jobId]/report" options={{ title: 'Job report' }} />
            <Stack.Screen name="(auth)" options={{ headerShown: false }} />
            <Stack.Screen name="account" options={{ title: 'Your account' }} />
            <Stack.Screen name="admin/users" options={{ title: 'Users and roles' }} />
            <Stack.Screen name="corrections/index" options={{ title: 'My proposals' }} />
            <Stack.Screen name="corrections/new" options={{ title: 'Propose a correction' }} />
            <Stack.Screen name="corrections/[correctionId]" options={{ title: 'Proposal' }} />
            <Stack.Screen name="review/index" options={{ title: 'Review corrections' }} />
            <Stack.Screen name="review/[correctionId]" options={{ title: 'Review' }} />
            <Stack.Screen name="editor/import" options={{ title: 'Import specs' }} />
            <Stack.Screen name="editor/specs/new" options={{ title: 'New spec' }} />
            <Stack.Screen name="editor/specs/[specId]" options={{ title: 'Edit spec' }} />
          </Stack>
        </View>
        <BottomBar />
      </SessionProvider>
    </QueryProvider>
  );
}

const styles = StyleSheet.create({ screens: { flex: 1 } });
