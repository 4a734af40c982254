import OutboxOutlined from '@mui/icons-material/OutboxOutlined';
import ReplayOutlined from '@mui/icons-material/ReplayOutlined';
import { Box, Button, Tooltip, Typography } from '@mui/material';
import { useState } from 'react';
import { DataTable, List, ReferenceField, ReferenceInput, SelectInput, AutocompleteInput, FunctionField, TextInput, useCanAccess, useDataProvider, useNotify, useRecordContext, useRefresh } from 'react-admin';
import { EmptyState } from '../common/EmptyState';
import { Guarded } from '../common/Guarded';
import { PageHeader } from '../common/PageHeader';
import { RelativeTime } from '../common/RelativeTime';
import { StatusChip } from '../common/StatusChip';
import type { PourgateDataProvider } from '../dataProvider';
import type { WebhookDelivery, WebhookEndpoint } from '../views/sdk';
import { formatDateTime } from '../format/dates';
import { monoFont } from '../theme';
import { AttemptsDialog } from './AttemptsDialog';
import { canReplay, deliveryStatusView, eventChoices, STATUS_CHOICES } from './webhookRules';

const filters = [
  <SelectInput key="status" source="status" label="Status" choices={STATUS_CHOICES} emptyText="Any status" alwaysOn />,
  <SelectInput key="eventType" source="eventType" label="Event" choices={eventChoices} emptyText="Any event" />,
  <ReferenceInput key="endpointId" source="endpointId" reference="webhook-endpoints" perPage={50} sort={{ field: 'createdAt', order: 'DESC' }}>
    <AutocompleteInput label="Endpoint" optionText={(e: WebhookEndpoint) => e?.url ?? ''} filterToQuery={(q: string) => (q ? { q } : {})} sx={{ minWidth: 280 }} />
  </ReferenceInput>,
  <TextInput key="eventId" source="eventId" label="Event id (webhook-id)" />,
];

function NoDeliveries() {
  return (
    <EmptyState icon={OutboxOutlined} title="Nothing delivered yet">
      Every event sent to an endpoint shows here with the receiver&apos;s answer, how long it took and when the next try
      is due. Test sends from the Webhooks page are answered on the spot and are not logged here.
    </EmptyState>
  );
}

function EventCell() {
  const d = useRecordContext<WebhookDelivery>();
  if (!d) return null;
  return (
    <Box>
      <Typography variant="body2" sx={{ fontFamily: monoFont, fontSize: '0.82rem' }}>
        {d.eventType}
      </Typography>
      <Tooltip title="webhook-id: the same on every retry and replay">
        <Typography variant="caption" color="text.secondary" sx={{ fontFamily: monoFont }}>
          {d.eventId.slice(0, 8)}…
        </Typography>
      </Tooltip>
    </Box>
  );
}

function StatusCell() {
  const d = useRecordContext<WebhookDelivery>();
  if (!d) return null;
  const v = deliveryStatusView(d.status);
  return (
    <Box>
      <StatusChip label={v.label} tone={v.tone} />
      <Typography variant="caption" component="div" color="text.secondary" sx={{ mt: 0.25, whiteSpace: 'nowrap' }}>
        {d.attempts} {d.attempts === 1 ? 'attempt' : 'attempts'}
        {d.replays ? ` · replayed ${d.replays}×` : ''}
      </Typography>
    </Box>
  );
}

function AnswerCell() {
  const d = useRecordContext<WebhookDelivery>();
  if (!d) return null;
  const code = d.lastStatusCode;
  const ok = code !== null && code >= 200 && code < 300;
  return (
    <Box sx={{ maxWidth: 320 }}>
      <Typography variant="body2" sx={{ whiteSpace: 'nowrap' }}>
        <Box component="span" sx={{ fontFamily: monoFont, fontWeight: 600, color: code === null ? 'text.secondary' : ok ? 'success.main' : 'error.main' }} data-testid="delivery-code">
          {code ?? '—'}
        </Box>
        {d.lastDurationMs !== null ? (
          <Box component="span" sx={{ color: 'text.secondary' }}>
            {' '}
            · {d.lastDurationMs} ms
          </Box>
        ) : null}
      </Typography>
      {d.lastError ? (
        <Typography variant="caption" color="error.main" component="div" sx={{ wordBreak: 'break-word' }}>
          {d.lastError}
        </Typography>
      ) : null}
    </Box>
  );
}

function NextCell() {
  const d = useRecordContext<WebhookDelivery>();
  if (!d) return null;
  if (d.status === 'succeeded') return <RelativeTime value={d.deliveredAt} prefix="delivered " />;
  if (d.nextAttemptAt && (d.status === 'retrying' || d.status === 'pending')) return <RelativeTime value={d.nextAttemptAt} prefix="next " />;
  if (d.status === 'dead') return <Typography variant="body2" color="text.secondary">No more tries</Typography>;
  return <Typography variant="body2" color="text.secondary">—</Typography>;
}

function RowActions() {
  const d = useRecordContext<WebhookDelivery>();
  const [open, setOpen] = useState(false);
  if (!d) return null;
  return (
    <Box sx={{ display: 'flex', justifyContent: 'flex-end', gap: 0.5 }}>
      <Button size="small" onClick={() => setOpen(true)} data-testid="delivery-attempts" sx={{ whiteSpace: 'nowrap' }}>
        Attempts
      </Button>
      <ReplayButton />
      {open ? <AttemptsDialog delivery={d} onClose={() => setOpen(false)} /> : null}
    </Box>
  );
}

function ReplayButton() {
  const d = useRecordContext<WebhookDelivery>();
  const { canAccess } = useCanAccess({ resource: 'webhook-deliveries', action: 'edit' });
  const dataProvider = useDataProvider<PourgateDataProvider>();
  const notify = useNotify();
  const refresh = useRefresh();
  const [busy, setBusy] = useState(false);
  if (!d || !canAccess || !canReplay(d)) return null;
  const replay = async () => {
    setBusy(true);
    try {
      await dataProvider.replayWebhookDelivery(d.id);
      notify('Queued again with the same webhook-id; receivers that de-duplicate will ignore a copy they already have.', { type: 'success' });
      refresh();
    } catch (error) {
      notify((error as Error).message, { type: 'error' });
    } finally {
      setBusy(false);
    }
  };
  return (
    <Button size="small" startIcon={<ReplayOutlined />} onClick={replay} disabled={busy} data-testid="replay-delivery" sx={{ whiteSpace: 'nowrap' }}>
      Replay
    </Button>
  );
}

export default function DeliveryListPage() {
  return (
    <Guarded resource="webhook-deliveries">
      <PageHeader
        title="Delivery log"
        lead="One row per event and endpoint: the last answer, the time it took and the next try. Retries follow the Standard Webhooks schedule; after the last one a delivery is given up and the admins get a mail. Replay sends it again with the same webhook-id."
      />
      <List resource="webhook-deliveries" title="Delivery log" filters={filters} empty={<NoDeliveries />} sort={{ field: 'createdAt', order: 'DESC' }} perPage={25} storeKey="webhook-deliveries.list">
        <DataTable bulkActionButtons={false} rowClick={false} rowSx={(d: WebhookDelivery) => (d.status === 'dead' ? { bgcolor: '#fdf2f1' } : {})}>
          <DataTable.Col source="createdAt" label="Event at" render={(d: WebhookDelivery) => <span style={{ whiteSpace: 'nowrap' }}>{formatDateTime(d.createdAt)}</span>} />
          <DataTable.Col label="Event" disableSort field={EventCell} />
          <DataTable.Col label="Endpoint" disableSort>
            <ReferenceField source="endpointId" reference="webhook-endpoints" link={false} emptyText="(removed)">
              <FunctionField render={(e: WebhookEndpoint) => <span style={{ fontFamily: monoFont, fontSize: '0.78rem', wordBreak: 'break-all' }}>{e.url}</span>} />
            </ReferenceField>
          </DataTable.Col>
          <DataTable.Col source="status" label="Status" field={StatusCell} />
          <DataTable.Col label="Answer" disableSort field={AnswerCell} />
          <DataTable.Col label="Next" disableSort field={NextCell} />
          <DataTable.Col label={<span className="visually-hidden">Actions</span>} disableSort align="right" field={RowActions} />
        </DataTable>
      </List>
    </Guarded>
  );
}
