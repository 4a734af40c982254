import { Box, LinearProgress, Skeleton } from '@mui/material';
import { useLoading } from 'react-admin';

/**
 * What the main area shows while a page's code or its first data is on the way: a progress bar at
 * once (react-admin's own loader waits a second before it draws anything) and the page's rough
 * shape, so the area is never blank after sign-in.
 */
export function PageLoading({ label = 'Loading the page', fullPage = false }: { label?: string; fullPage?: boolean }) {
  return (
    <Box data-testid="page-loading" sx={{ pt: fullPage ? 0 : 1, ...(fullPage ? { position: 'fixed', inset: 0, bgcolor: 'background.default' } : {}) }}>
      <LinearProgress aria-label={label} />
      <Box sx={{ p: fullPage ? 3 : 0, pt: 2, display: 'grid', gap: 1.5, maxWidth: 1240 }} aria-hidden>
        <Skeleton variant="text" width={260} height={40} />
        <Skeleton variant="text" width="min(560px, 90%)" />
        <Skeleton variant="rounded" height={160} />
        <Skeleton variant="rounded" height={220} />
      </Box>
    </Box>
  );
}

/** The full-window variant, for react-admin's `loading` slot (the session being checked). */
export function PageLoadingFull() {
  return <PageLoading fullPage label="Opening the console" />;
}

/**
 * A thin bar under the app bar while any first load of data is in flight (react-admin's count of
 * pending queries): lists and detail pages show progress from the first moment, not after a second.
 */
export function DataProgress() {
  const loading = useLoading();
  return (
    <Box sx={{ position: 'sticky', top: 0, height: 3, mb: -0.375, zIndex: 2 }} aria-live="off">
      {loading ? <LinearProgress aria-label="Loading data" data-testid="data-progress" sx={{ height: 3 }} /> : null}
    </Box>
  );
}
