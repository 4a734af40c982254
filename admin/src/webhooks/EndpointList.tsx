import AddOutlined from '@mui/icons-material/AddOutlined';
import Autorenew from '@mui/icons-material/Autorenew';
import DeleteOutline from '@mui/icons-material/DeleteOutline';
import EditOutlined from '@mui/icons-material/EditOutlined';
import PauseCircleOutline from '@mui/icons-material/PauseCircleOutline';
import PlayCircleOutline from '@mui/icons-material/PlayCircleOutline';
import SendOutlined from '@mui/icons-material/SendOutlined';
import WebhookOutlined from '@mui/icons-material/WebhookOutlined';
import { Box, Button, Chip, IconButton, Link as MuiLink, Tooltip, Typography } from '@mui/material';
import { createContext, useContext, useMemo, useState, type ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { Confirm, DataTable, List, NullableBooleanInput, SearchInput, TopToolbar, useCanAccess, useDataProvider, useNotify, useRecordContext, useRefresh } from 'react-admin';
import { EmptyState } from '../common/EmptyState';
import { Guarded } from '../common/Guarded';
import { PageHeader } from '../common/PageHeader';
import { StatusChip } from '../common/StatusChip';
import type { WebhookEndpoint } from '../views/sdk';
import { formatDate, formatDateTime } from '../format/dates';
import { monoFont } from '../theme';
import { CreateEndpointDialog, EditEndpointDialog, RotateSecretDialog, TestEndpointDialog } from './EndpointDialogs';
import { endpointStateView } from './webhookRules';

type Open = { type: 'create' } | { type: 'edit' | 'test' | 'rotate'; endpoint: WebhookEndpoint } | null;
const DialogsContext = createContext<(o: Open) => void>(() => undefined);

function DialogsProvider({ children }: { children: ReactNode }) {
  const [open, setOpen] = useState<Open>(null);
  const refresh = useRefresh();
  const close = (changed?: boolean) => {
    setOpen(null);
    if (changed) refresh();
  };
  return (
    <DialogsContext.Provider value={setOpen}>
      {children}
      {open?.type === 'create' ? <CreateEndpointDialog onClose={close} /> : null}
      {open?.type === 'edit' ? <EditEndpointDialog endpoint={open.endpoint} onClose={close} /> : null}
      {open?.type === 'test' ? <TestEndpointDialog endpoint={open.endpoint} onClose={() => close(true)} /> : null}
      {open?.type === 'rotate' ? <RotateSecretDialog endpoint={open.endpoint} onClose={close} /> : null}
    </DialogsContext.Provider>
  );
}

function AddButton() {
  const { canAccess } = useCanAccess({ resource: 'webhook-endpoints', action: 'create' });
  const open = useContext(DialogsContext);
  if (!canAccess) return null;
  return (
    <Button variant="contained" size="small" startIcon={<AddOutlined />} onClick={() => open({ type: 'create' })} data-testid="add-endpoint">
      Add endpoint
    </Button>
  );
}

function NoEndpoints() {
  return (
    <EmptyState icon={WebhookOutlined} title="No webhook endpoints yet" action={<AddButton />}>
      An endpoint receives signed events (readings judged, batches held or released, work orders) as they happen, so
      the ERP need not poll. Each endpoint has its own signing secret.
    </EmptyState>
  );
}

function UrlCell() {
  const e = useRecordContext<WebhookEndpoint>();
  if (!e) return null;
  return (
    <Box sx={{ maxWidth: 420 }}>
      <Typography variant="body2" sx={{ fontFamily: monoFont, fontSize: '0.82rem', wordBreak: 'break-all' }} data-testid="endpoint-url">
        {e.url}
      </Typography>
      {e.description ? (
        <Typography variant="caption" color="text.secondary">
          {e.description}
        </Typography>
      ) : null}
    </Box>
  );
}

function EventsCell() {
  const e = useRecordContext<WebhookEndpoint>();
  if (!e) return null;
  if (!e.eventTypes.length) return <Typography variant="body2">Every event</Typography>;
  const shown = e.eventTypes.slice(0, 3);
  return (
    <Box sx={{ display: 'flex', flexWrap: 'wrap', gap: 0.5, maxWidth: 300 }}>
      {shown.map((t) => (
        <Chip key={t} label={t} size="small" variant="outlined" sx={{ fontFamily: monoFont, fontSize: '0.7rem', height: 20, borderRadius: '4px' }} />
      ))}
      {e.eventTypes.length > shown.length ? (
        <Tooltip title={e.eventTypes.slice(3).join(', ')}>
          <Chip label={`+${e.eventTypes.length - shown.length}`} size="small" sx={{ height: 20, borderRadius: '4px' }} />
        </Tooltip>
      ) : null}
    </Box>
  );
}

function StateCell() {
  const e = useRecordContext<WebhookEndpoint>();
  if (!e) return null;
  const v = endpointStateView(e);
  return (
    <Box>
      <StatusChip label={v.label} tone={v.tone} />
      {v.note && !e.enabled ? (
        <Typography variant="caption" component="div" color="text.secondary" sx={{ mt: 0.25, maxWidth: 220 }}>
          {v.note}
        </Typography>
      ) : null}
      {e.secretRotating && e.previousSecretUntil ? (
        <Typography variant="caption" component="div" color="text.secondary" sx={{ mt: 0.25, whiteSpace: 'nowrap' }}>
          Two secrets sign until {formatDateTime(e.previousSecretUntil)}
        </Typography>
      ) : null}
    </Box>
  );
}

function RowActions() {
  const e = useRecordContext<WebhookEndpoint>();
  const { canAccess } = useCanAccess({ resource: 'webhook-endpoints', action: 'edit' });
  const open = useContext(DialogsContext);
  const dataProvider = useDataProvider();
  const notify = useNotify();
  const refresh = useRefresh();
  const [removing, setRemoving] = useState(false);
  const [busy, setBusy] = useState(false);
  if (!e) return null;
  const log = (
    <Tooltip title="Deliveries to this endpoint">
      <Button size="small" component={Link} to={`/webhook-deliveries?filter=${encodeURIComponent(JSON.stringify({ endpointId: e.id }))}`} sx={{ minWidth: 0, whiteSpace: 'nowrap' }}>
        Log
      </Button>
    </Tooltip>
  );
  if (!canAccess) return <Box sx={{ display: 'flex', justifyContent: 'flex-end' }}>{log}</Box>;
  const toggle = async () => {
    setBusy(true);
    try {
      await dataProvider.update('webhook-endpoints', { id: e.id, data: { ...e, enabled: !e.enabled }, previousData: e });
      notify(e.enabled ? 'Paused: events are kept in the feed but not sent here.' : 'Sending again from now on.', { type: 'success' });
      refresh();
    } catch (error) {
      notify((error as Error).message, { type: 'error' });
    } finally {
      setBusy(false);
    }
  };
  const remove = async () => {
    setBusy(true);
    try {
      await dataProvider.delete('webhook-endpoints', { id: e.id, previousData: e });
      notify('Endpoint removed.', { type: 'success' });
      refresh();
    } catch (error) {
      notify((error as Error).message, { type: 'error' });
    } finally {
      setBusy(false);
      setRemoving(false);
    }
  };
  return (
    <Box sx={{ display: 'flex', justifyContent: 'flex-end', alignItems: 'center' }}>
      <Button size="small" variant="outlined" startIcon={<SendOutlined />} onClick={() => open({ type: 'test', endpoint: e })} sx={{ mr: 0.5, whiteSpace: 'nowrap' }} data-testid="send-test">
        Send test
      </Button>
      {log}
      <Tooltip title="Change URL, description or events">
        <IconButton size="small" aria-label={`Change ${e.url}`} onClick={() => open({ type: 'edit', endpoint: e })}>
          <EditOutlined fontSize="small" />
        </IconButton>
      </Tooltip>
      <Tooltip title="Rotate the signing secret">
        <IconButton size="small" aria-label={`Rotate the secret of ${e.url}`} onClick={() => open({ type: 'rotate', endpoint: e })}>
          <Autorenew fontSize="small" />
        </IconButton>
      </Tooltip>
      <Tooltip title={e.enabled ? 'Pause sending' : 'Resume sending'}>
        <span>
          <IconButton size="small" aria-label={e.enabled ? `Pause ${e.url}` : `Resume ${e.url}`} onClick={toggle} disabled={busy} data-testid="toggle-endpoint">
            {e.enabled ? <PauseCircleOutline fontSize="small" /> : <PlayCircleOutline fontSize="small" />}
          </IconButton>
        </span>
      </Tooltip>
      <Tooltip title="Remove">
        <IconButton size="small" aria-label={`Remove ${e.url}`} onClick={() => setRemoving(true)} sx={{ color: 'error.main' }}>
          <DeleteOutline fontSize="small" />
        </IconButton>
      </Tooltip>
      <Confirm
        isOpen={removing}
        loading={busy}
        title="Remove this endpoint?"
        content={<>Nothing more is sent to <code style={{ fontFamily: monoFont }}>{e.url}</code>, and its delivery history goes with it. To stop for a while, pause it instead.</>}
        confirm="Remove endpoint"
        confirmColor="warning"
        onConfirm={remove}
        onClose={() => setRemoving(false)}
      />
    </Box>
  );
}

export default function EndpointListPage() {
  return (
    <Guarded resource="webhook-endpoints">
      <DialogsProvider>
        <EndpointList />
      </DialogsProvider>
    </Guarded>
  );
}

function EndpointList() {
  const filters = useMemo(
    () => [
      <SearchInput key="q" source="q" alwaysOn placeholder="URL" />,
      <NullableBooleanInput key="enabled" source="enabled" label="State" trueLabel="Sending" falseLabel="Paused" nullLabel="Any" />,
    ],
    [],
  );
  return (
    <>
      <PageHeader
        title="Webhooks"
        lead={
          <>
            Endpoints that receive Pourgate&apos;s events, signed per the Standard Webhooks specification. Failed deliveries are
            retried with backoff for about a day, then listed in the{' '}
            <MuiLink component={Link} to="/webhook-deliveries">
              delivery log
            </MuiLink>{' '}
            for replay.
          </>
        }
      />
      <List resource="webhook-endpoints" title="Webhooks" filters={filters} actions={<TopToolbar><AddButton /></TopToolbar>} empty={<NoEndpoints />} sort={{ field: 'createdAt', order: 'DESC' }} perPage={25} storeKey="webhook-endpoints.list">
        <DataTable bulkActionButtons={false} rowClick={false} rowSx={(e: WebhookEndpoint) => (e.enabled ? {} : { bgcolor: '#f7f6f2' })}>
          <DataTable.Col source="url" label="Receiver" field={UrlCell} />
          <DataTable.Col label="Events" disableSort field={EventsCell} />
          <DataTable.Col label="State" disableSort field={StateCell} />
          <DataTable.Col source="createdAt" label="Added" render={(e: WebhookEndpoint) => <span style={{ whiteSpace: 'nowrap' }}>{formatDate(e.createdAt)}</span>} />
          <DataTable.Col label={<span className="visually-hidden">Actions</span>} disableSort align="right" field={RowActions} />
        </DataTable>
      </List>
    </>
  );
}
