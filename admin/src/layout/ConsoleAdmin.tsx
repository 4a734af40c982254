import { CssBaseline } from '@mui/material';
import { lazy, Suspense, useMemo, type ReactNode } from 'react';
import { Navigate, useLocation } from 'react-router-dom';
import {
  AdminContext,
  AuthenticationError,
  CoreAdminUI,
  defaultI18nProvider,
  Error as ErrorPage,
  localStorageStore,
  Notification,
  type AuthProvider,
  type DashboardComponent,
  type DataProvider,
  type LoginComponent,
  type RaThemeOptions,
} from 'react-admin';
import { PageLoadingFull } from '../common/PageLoading';
import { NoAccessPage, NotFoundPage } from '../common/StatusPages';
import { SESSION_KEY } from '../dataProvider/session';

// The signed-in frame (app bar, side menu) is its own chunk: the sign-in page does not need it.
const loadLayout = () => import('./Layout');
const LazyLayout = lazy(loadLayout);
// with a session already in this tab, fetch the frame while the session is being checked
if (typeof sessionStorage !== 'undefined' && sessionStorage.getItem(SESSION_KEY)) void loadLayout();


/**
 * Without a session, go straight to sign-in (remembering where the person was headed) before any
 * of the signed-in frame is fetched or drawn. react-admin's own `requireAuth` does the same, but
 * its sign-out-on-mount races React Router's transitions and can leave a blank page after sign-out.
 */
function guardedLayout(isSignedIn: () => boolean) {
  return function Layout({ children }: { children: ReactNode }) {
    const location = useLocation();
    if (!isSignedIn()) {
      return <Navigate to="/login" replace state={{ nextPathname: location.pathname, nextSearch: location.search }} />;
    }
    return (
      <Suspense fallback={<PageLoadingFull />}>
        <LazyLayout>{children}</LazyLayout>
      </Suspense>
    );
  };
}

const store = localStorageStore(undefined, 'pourgate');

export interface ConsoleAdminProps {
  children: ReactNode;
  dataProvider: DataProvider;
  authProvider: AuthProvider;
  theme: RaThemeOptions;
  loginPage: LoginComponent;
  dashboard: DashboardComponent;
  title: string;
  /** Synchronous: is there a session in this tab at all? (The API still checks every token.) */
  isSignedIn: () => boolean;
}

/**
 * react-admin's `<Admin>`, assembled from its parts so that only the pieces Pourgate uses are
 * bundled (its stock sign-in form and OAuth callback page are not). Telemetry is off.
 */
export function ConsoleAdmin({ children, dataProvider, authProvider, theme, loginPage, dashboard, title, isSignedIn }: ConsoleAdminProps) {
  const Layout = useMemo(() => guardedLayout(isSignedIn), [isSignedIn]);
  return (
    <AdminContext dataProvider={dataProvider} authProvider={authProvider} i18nProvider={defaultI18nProvider} store={store} theme={theme}>
      <CssBaseline enableColorScheme>
        <CoreAdminUI
          title={title}
          layout={Layout}
          loginPage={loginPage}
          dashboard={dashboard}
          catchAll={NotFoundPage}
          loading={PageLoadingFull}
          error={ErrorPage}
          accessDenied={NoAccessPage}
          authenticationError={AuthenticationError}
          authCallbackPage={false}
          disableTelemetry
        >
          {children}
        </CoreAdminUI>
        <Notification />
      </CssBaseline>
    </AdminContext>
  );
}
