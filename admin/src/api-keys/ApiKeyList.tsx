import Autorenew from '@mui/icons-material/Autorenew';
import Block from '@mui/icons-material/BlockOutlined';
import KeyOutlined from '@mui/icons-material/KeyOutlined';
import { Box, Button, Chip, FormControlLabel, IconButton, Switch, Tooltip, Typography } from '@mui/material';
import { useMemo, useState, type ReactNode } from 'react';
import {
  Confirm,
  DataTable,
  FunctionField,
  List,
  ListContextProvider,
  ReferenceField,
  SearchInput,
  SelectInput,
  TopToolbar,
  useCanAccess,
  useDataProvider,
  useGetIdentity,
  useListContext,
  useNotify,
  useRecordContext,
  useRefresh,
} from 'react-admin';
import type { PourgateIdentity } from '../authProvider';
import { EmptyState } from '../common/EmptyState';
import { Guarded } from '../common/Guarded';
import { PageHeader } from '../common/PageHeader';
import { RelativeTime } from '../common/RelativeTime';
import { StatusChip } from '../common/StatusChip';
import { useNow } from '../common/useNow';
import type { PourgateDataProvider } from '../dataProvider';
import { formatDate, formatDateTime } from '../format/dates';
import { monoFont } from '../theme';
import type { ApiKey } from '../views/sdk';
import { KeyDialogsProvider, useKeyDialogs } from './KeyDialogs';
import { canManageKey, expiryText, keyRows, keyStateView, KIND_LABEL, kindsAllowed } from './keyRules';

/** A list row: the key and, after a rotation, the predecessor whose secret may still work. */
type KeyRecord = ApiKey & { previous: ApiKey | null };

const filters = [
  <SearchInput key="q" source="q" alwaysOn placeholder="Key name" />,
  <SelectInput
    key="kind"
    source="kind"
    label="Kind"
    choices={[
      { id: 'device', name: 'Device' },
      { id: 'integration', name: 'Integration' },
    ]}
    emptyText="Any kind"
  />,
  <SelectInput
    key="environment"
    source="environment"
    label="Environment"
    choices={[
      { id: 'live', name: 'Live' },
      { id: 'test', name: 'Test' },
    ]}
    emptyText="Any"
  />,
];

function useRole() {
  const { identity } = useGetIdentity();
  return (identity as PourgateIdentity | undefined)?.role;
}

function IssueKeyButton() {
  const role = useRole();
  const { canAccess } = useCanAccess({ resource: 'api-keys', action: 'create' });
  const dialogs = useKeyDialogs();
  const kinds = kindsAllowed(role);
  if (!canAccess || kinds.length === 0) return null;
  return (
    <Button variant="contained" size="small" startIcon={<KeyOutlined />} onClick={dialogs.issue} data-testid="issue-key">
      {kinds.length === 1 ? 'Issue a device key' : 'Issue a key'}
    </Button>
  );
}

function Actions() {
  return (
    <TopToolbar>
      <IssueKeyButton />
    </TopToolbar>
  );
}

function NoKeys() {
  return (
    <EmptyState icon={KeyOutlined} title="No API keys yet" action={<IssueKeyButton />}>
      Bench scales and temperature loggers post readings with a device key; the ERP posts work orders and fetches targets with an integration key. Each key carries only the scopes you give it.
    </EmptyState>
  );
}

function KeyCell() {
  const k = useRecordContext<ApiKey>();
  if (!k) return null;
  return (
    <Box>
      <Typography variant="body2" sx={{ fontWeight: 500 }}>
        {k.name}
      </Typography>
      <Typography variant="caption" sx={{ fontFamily: monoFont, color: 'text.secondary' }} data-testid="key-prefix">
        {k.prefix}…
      </Typography>
    </Box>
  );
}

function KindCell() {
  const k = useRecordContext<ApiKey>();
  if (!k) return null;
  return (
    <Box>
      <Box sx={{ display: 'flex', alignItems: 'center', gap: 0.75 }}>
        <Typography variant="body2">{KIND_LABEL[k.kind] ?? k.kind}</Typography>
        {k.environment === 'live' ? <StatusChip tone="info" label="Live" /> : <StatusChip tone="quiet" label="Test" />}
      </Box>
      {k.deviceId ? (
        <Typography variant="caption" color="text.secondary" component="div">
          <ReferenceField source="deviceId" reference="devices" link={false} emptyText="">
            <FunctionField render={(d: { name: string; serial: string }) => `${d.name} · ${d.serial}`} variant="caption" />
          </ReferenceField>
        </Typography>
      ) : null}
    </Box>
  );
}

function ScopesCell() {
  const k = useRecordContext<ApiKey>();
  if (!k) return null;
  return (
    <Box sx={{ display: 'flex', flexWrap: 'wrap', gap: 0.5, minWidth: 160, maxWidth: 240 }}>
      {k.scopes.map((s) => (
        <Chip key={s} label={s} size="small" variant="outlined" sx={{ fontFamily: monoFont, fontSize: '0.7rem', height: 20, borderRadius: '4px' }} />
      ))}
    </Box>
  );
}

function StateCell() {
  const k = useRecordContext<KeyRecord>();
  if (!k) return null;
  const v = keyStateView(k);
  const prev = k.previous;
  return (
    <Box>
      <StatusChip label={v.label} tone={v.tone} />
      {v.note && k.state === 'grace' ? (
        <Typography variant="caption" component="div" color="text.secondary" sx={{ mt: 0.25, whiteSpace: 'nowrap' }}>
          {v.note}
        </Typography>
      ) : null}
      {prev && prev.state === 'grace' ? (
        <Typography variant="caption" component="div" color="text.secondary" sx={{ mt: 0.25 }} data-testid="grace-secret">
          Previous secret <span style={{ fontFamily: monoFont }}>{prev.prefix}…</span> still accepted{prev.graceUntil ? ` until ${formatDateTime(prev.graceUntil)}` : ''}
        </Typography>
      ) : prev ? (
        <Typography variant="caption" component="div" color="text.secondary" sx={{ mt: 0.25 }}>
          Rotated from <span style={{ fontFamily: monoFont }}>{prev.prefix}…</span>
        </Typography>
      ) : null}
    </Box>
  );
}

function LastUsedCell() {
  const k = useRecordContext<ApiKey>();
  if (!k) return null;
  return (
    <Box>
      <RelativeTime value={k.lastUsedAt} empty="Never used" />
      {k.lastUsedIp ? (
        <Typography variant="caption" component="div" color="text.secondary" sx={{ fontFamily: monoFont }}>
          {k.lastUsedIp}
        </Typography>
      ) : null}
    </Box>
  );
}

function ExpiryCell() {
  const k = useRecordContext<ApiKey>();
  const now = useNow();
  if (!k) return null;
  const label = expiryText(k, now);
  if (k.state === 'revoked')
    return (
      <Typography variant="body2" color="text.secondary">
        {label}
      </Typography>
    );
  return k.expiresAt && k.state === 'active' ? (
    <Tooltip title={formatDateTime(k.expiresAt)}>
      <span style={{ whiteSpace: 'nowrap' }}>{label}</span>
    </Tooltip>
  ) : (
    <Typography variant="body2" color="text.secondary">
      {label}
    </Typography>
  );
}

function CreatedCell() {
  const k = useRecordContext<ApiKey>();
  if (!k) return null;
  return (
    <Box>
      <Typography variant="body2" sx={{ whiteSpace: 'nowrap' }}>
        {formatDate(k.createdAt)}
      </Typography>
      {k.createdBy ? (
        <Typography variant="caption" color="text.secondary" component="div" sx={{ whiteSpace: 'nowrap' }}>
          by {k.createdBy.name}
        </Typography>
      ) : null}
    </Box>
  );
}

function RowActions() {
  const k = useRecordContext<ApiKey>();
  const role = useRole();
  const { canAccess } = useCanAccess({ resource: 'api-keys', action: 'edit' });
  const dataProvider = useDataProvider<PourgateDataProvider>();
  const notify = useNotify();
  const refresh = useRefresh();
  const dialogs = useKeyDialogs();
  const [revoking, setRevoking] = useState(false);
  const [busy, setBusy] = useState(false);
  if (!k || !canAccess) return null;
  const may = canManageKey(role, k);
  if (!may.rotate && !may.revoke) return null;

  const revoke = async () => {
    setBusy(true);
    try {
      await dataProvider.revokeApiKey(k.id);
      notify(`“${k.name}” is revoked with every secret it had, including one still in a rotation grace period. Requests with any of them are refused from now on.`, { type: 'success' });
      refresh();
    } catch (error) {
      notify((error as Error).message, { type: 'error' });
    } finally {
      setBusy(false);
      setRevoking(false);
    }
  };

  return (
    <Box sx={{ display: 'flex', justifyContent: 'flex-end' }}>
      {may.rotate ? (
        <Tooltip title="Rotate: new secret, old one kept for a grace period">
          <IconButton size="small" aria-label={`Rotate ${k.name}`} onClick={() => dialogs.rotate(k)}>
            <Autorenew fontSize="small" />
          </IconButton>
        </Tooltip>
      ) : null}
      {may.revoke ? (
        <Tooltip title="Revoke now">
          <IconButton size="small" aria-label={`Revoke ${k.name}`} onClick={() => setRevoking(true)} sx={{ color: 'error.main' }}>
            <Block fontSize="small" />
          </IconButton>
        </Tooltip>
      ) : null}
      <Confirm
        isOpen={revoking}
        loading={busy}
        title={`Revoke “${k.name}”?`}
        content={
          <>
            Every secret of this key is refused from the moment you confirm: <code style={{ fontFamily: monoFont }}>{k.prefix}…</code>, the secret it replaced if that one is still in its rotation
            grace period, and the secret that replaced it if it was rotated. This cannot be undone; issue a new key to reconnect.
          </>
        }
        confirm="Revoke key"
        confirmColor="warning"
        onConfirm={revoke}
        onClose={() => setRevoking(false)}
      />
    </Box>
  );
}

export default function ApiKeyListPage() {
  return (
    <Guarded resource="api-keys">
      <ApiKeyList />
    </Guarded>
  );
}

/** The page's keys folded into one row per key (rotations), revoked ones only on request. */
function CurrentKeys({ showRevoked, children }: { showRevoked: boolean; children: ReactNode }) {
  const ctx = useListContext<ApiKey>();
  const data = useMemo(() => keyRows(ctx.data ?? [], showRevoked).map(({ key, previous }): KeyRecord => ({ ...key, previous })), [ctx.data, showRevoked]);
  return <ListContextProvider value={{ ...ctx, data } as unknown as typeof ctx}>{children}</ListContextProvider>;
}

function ApiKeyList() {
  const [showRevoked, setShowRevoked] = useState(false);
  const role = useRole();
  const lead =
    role === 'integrator'
      ? 'Device keys for bench scales and temperature loggers. Each key has scopes, an expiry and a secret shown only once. Integration keys for the ERP are issued by an IT admin.'
      : 'Keys for machines: bench scales and loggers (device keys) and the ERP or other systems (integration keys). Secrets are shown once; rotate with a grace period, revoke at once.';
  return (
    <KeyDialogsProvider kinds={kindsAllowed(role)}>
      <PageHeader
        title="API keys"
        lead={lead}
        actions={<FormControlLabel control={<Switch size="small" checked={showRevoked} onChange={(e) => setShowRevoked(e.target.checked)} data-testid="show-revoked" />} label="Show revoked keys" />}
      />
      <List resource="api-keys" title="API keys" filters={filters} actions={<Actions />} empty={<NoKeys />} sort={{ field: 'createdAt', order: 'DESC' }} perPage={25} storeKey="api-keys.list">
        <CurrentKeys showRevoked={showRevoked}>
          <Box sx={{ overflowX: 'auto' }} tabIndex={0} role="region" aria-label="API keys table">
            <DataTable bulkActionButtons={false} rowClick={false} rowSx={(k: ApiKey) => (k.state === 'revoked' || k.state === 'expired' ? { opacity: 0.72 } : {})}>
              <DataTable.Col source="name" label="Key" field={KeyCell} />
              <DataTable.Col source="kind" label="Kind" disableSort field={KindCell} />
              <DataTable.Col label="Scopes" disableSort field={ScopesCell} />
              <DataTable.Col source="state" label="State" disableSort field={StateCell} />
              <DataTable.Col source="lastUsedAt" label="Last used" field={LastUsedCell} />
              <DataTable.Col source="expiresAt" label="Expiry" field={ExpiryCell} />
              <DataTable.Col source="createdAt" label="Issued" field={CreatedCell} />
              <DataTable.Col label={<span className="visually-hidden">Actions</span>} disableSort align="right" field={RowActions} />
            </DataTable>
          </Box>
        </CurrentKeys>
      </List>
    </KeyDialogsProvider>
  );
}
