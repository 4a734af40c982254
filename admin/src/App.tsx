import { CustomRoutes, Resource } from 'react-admin';
import { Route } from 'react-router-dom';
import apiKeys from './api-keys';
import audit from './audit';
import { SignInPage } from './auth/SignInPage';
import { Dashboard } from './dashboard';
import { AcceptInvitationPage } from './invitations/AcceptInvitationPage';
import invitations from './invitations';
import { ConsoleAdmin } from './layout/ConsoleAdmin';
import { authProvider, dataProvider, isSignedIn } from './providers';
import { theme } from './theme';
import users from './users';

export function App() {
  return (
    <ConsoleAdmin title="Pourgate" dataProvider={dataProvider} authProvider={authProvider} loginPage={SignInPage} dashboard={Dashboard} theme={theme} isSignedIn={isSignedIn}>
      <Resource name="users" {...users} />
      <Resource name="invitations" {...invitations} />
      <Resource name="api-keys" {...apiKeys} />
      <Resource name="audit-events" {...audit} />
      <CustomRoutes noLayout>
        <Route path="/accept-invitation" element={<AcceptInvitationPage />} />
      </CustomRoutes>
    </ConsoleAdmin>
  );
}
