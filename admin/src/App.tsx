import { CustomRoutes, Resource } from 'react-admin';
import { Route } from 'react-router-dom';
import apiKeys from './api-keys';
import audit from './audit';
import devices from './devices';
import lots from './lots';
import materialSystems from './materials';
import molds from './molds';
import cupTests from './qc';
import workOrders from './work-orders';
import batches, { PourSheetPage } from './batches';
import { CalculatorPage } from './calculator';
import { ControlPage } from './control';
import { PlanBatchPage } from './planning';
import { LotTracePage, RecallReportPage } from './genealogy';
import { DefectsPage } from './parts';
import { SignInPage } from './auth/SignInPage';
import { Dashboard } from './dashboard';
import { AcceptInvitationPage } from './invitations/AcceptInvitationPage';
import invitations from './invitations';
import { ImportsPage } from './imports';
import { ReadingListPage } from './readings';
import { LivePage } from './live';
import { ConsoleAdmin } from './layout/ConsoleAdmin';
import { ProfilePage } from './profile';
import { authProvider, dataProvider, isSignedIn } from './providers';
import readings from './review';
import { theme } from './theme';
import users from './users';
import { webhookDeliveries, webhookEndpoints } from './webhooks';

export function App() {
  return (
    <ConsoleAdmin title="Pourgate" dataProvider={dataProvider} authProvider={authProvider} loginPage={SignInPage} dashboard={Dashboard} theme={theme} isSignedIn={isSignedIn}>
      <Resource name="users" {...users} />
      <Resource name="invitations" {...invitations} />
      <Resource name="api-keys" {...apiKeys} />
      <Resource name="audit-events" {...audit} />
      <Resource name="material-systems" {...materialSystems} />
      <Resource name="lots" {...lots} />
      <Resource name="molds" {...molds} />
      <Resource name="work-orders" {...workOrders} />
      <Resource name="qc-cup-tests" {...cupTests} />
      <Resource name="devices" {...devices} />
      <Resource name="webhook-endpoints" {...webhookEndpoints} />
      <Resource name="webhook-deliveries" {...webhookDeliveries} />
      <CustomRoutes>
        <Route path="/profile" element={<ProfilePage />} />
      </CustomRoutes>
      <Resource name="readings" {...readings} />
      <Resource name="batches" {...batches} />
      <CustomRoutes>
        <Route path="/batches/:id/pour-sheet" element={<PourSheetPage />} />
        <Route path="/batches/plan" element={<PlanBatchPage />} />
        <Route path="/lots/:id/trace" element={<LotTracePage />} />
        <Route path="/lots/:id/recall" element={<RecallReportPage />} />
        <Route path="/defects" element={<DefectsPage />} />
        <Route path="/calculator" element={<CalculatorPage />} />
        <Route path="/imports" element={<ImportsPage />} />
        <Route path="/reading-log" element={<ReadingListPage />} />
        <Route path="/live" element={<LivePage />} />
        <Route path="/control" element={<ControlPage />} />
      </CustomRoutes>
      <CustomRoutes noLayout>
        <Route path="/accept-invitation" element={<AcceptInvitationPage />} />
      </CustomRoutes>
    </ConsoleAdmin>
  );
}
