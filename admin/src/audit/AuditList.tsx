import ComputerOutlined from '@mui/icons-material/DnsOutlined';
import KeyOutlined from '@mui/icons-material/KeyOutlined';
import PersonOutline from '@mui/icons-material/PersonOutline';
import HelpOutline from '@mui/icons-material/HelpOutline';
import { Box, Button, Dialog, DialogActions, DialogContent, DialogTitle, Typography } from '@mui/material';
import { useMemo, useState } from 'react';
import { DataTable, DateInput, List, ReferenceField, SelectInput, useGetList, useRecordContext } from 'react-admin';
import ReceiptLongOutlined from '@mui/icons-material/ReceiptLongOutlined';
import { EmptyState } from '../common/EmptyState';
import { Guarded } from '../common/Guarded';
import { PageHeader } from '../common/PageHeader';
import { RelativeTime } from '../common/RelativeTime';
import { dayEndIso, dayStartIso, formatDateTime, isoToDay } from '../format/dates';
import { monoFont } from '../theme';
import type { ActorType, AuditEntry, User } from '../views/sdk';
import { ACTION_CHOICES, actionLabel, ACTOR_LABEL, detailRows, TARGET_LABEL, TARGET_RESOURCE } from './auditFormat';

const ACTOR_ICON: Record<ActorType, typeof PersonOutline> = {
  user: PersonOutline,
  api_key: KeyOutlined,
  system: ComputerOutlined,
  anonymous: HelpOutline,
};

/** People to filter by; a plain list (not a reference input) so no by-id lookups are needed. */
function ActorFilter(props: { source: string; label: string; alwaysOn?: boolean }) {
  const { data } = useGetList<User>('users', { pagination: { page: 1, perPage: 200 }, sort: { field: 'name', order: 'ASC' } });
  const choices = useMemo(() => (data ?? []).map((u) => ({ id: u.id, name: u.name })), [data]);
  return <SelectInput {...props} choices={choices} emptyText="Anyone" />;
}

const filters = [
  <SelectInput key="action" source="action" label="Action" alwaysOn choices={ACTION_CHOICES} emptyText="Any action" />,
  <ActorFilter key="actorId" source="actorId" label="Person" alwaysOn />,
  <DateInput key="from" source="createdAt_gte" label="From" alwaysOn parse={dayStartIso} format={isoToDay} />,
  <DateInput key="to" source="createdAt_lte" label="To" alwaysOn parse={dayEndIso} format={isoToDay} />,
];

function ActorCell() {
  const e = useRecordContext<AuditEntry>();
  if (!e) return null;
  const Icon = ACTOR_ICON[e.actorType] ?? HelpOutline;
  return (
    <Box sx={{ display: 'flex', gap: 1, alignItems: 'center' }}>
      <Icon sx={{ fontSize: 18, color: 'text.secondary' }} aria-hidden />
      <Box>
        <Typography variant="body2">{e.actorLabel ?? ACTOR_LABEL[e.actorType] ?? e.actorType}</Typography>
        <Typography variant="caption" color="text.secondary">
          {ACTOR_LABEL[e.actorType] ?? e.actorType}
        </Typography>
      </Box>
    </Box>
  );
}

function ActionCell() {
  const e = useRecordContext<AuditEntry>();
  if (!e) return null;
  return (
    <Typography variant="body2" title={e.action}>
      {actionLabel(e.action)}
    </Typography>
  );
}

function TargetCell() {
  const e = useRecordContext<AuditEntry>();
  if (!e || !e.targetType) return <span>—</span>;
  const reference = TARGET_RESOURCE[e.targetType];
  const short = e.targetId ? (e.targetId.length > 14 ? `${e.targetId.slice(0, 8)}…` : e.targetId) : null;
  return (
    <Box>
      <Typography variant="caption" color="text.secondary" component="div">
        {TARGET_LABEL[e.targetType] ?? actionLabel(e.targetType)}
      </Typography>
      {e.targetId && reference ? (
        // the name as the target's own list shows it; the short id only when it cannot be read (removed, or not yours to see)
        <ReferenceField source="targetId" reference={reference} link={false} emptyText={short ?? ''}>
          <RecordName fallback={short ?? ''} />
        </ReferenceField>
      ) : short ? (
        <Typography variant="body2" sx={{ fontFamily: monoFont, fontSize: '0.8rem' }} title={e.targetId ?? undefined}>
          {short}
        </Typography>
      ) : null}
    </Box>
  );
}

/** A referenced record by the name people know it by. */
function RecordName({ fallback }: { fallback: string }) {
  const r = useRecordContext<Record<string, unknown>>();
  const name = r ? (r.name ?? r.email ?? r.lotNumber ?? r.externalRef ?? r.url ?? r.materialSystemName) : undefined;
  return <Typography variant="body2">{typeof name === 'string' && name ? name : fallback}</Typography>;
}

/** The full entry, on request: ids, address, every detail the API recorded. */
function DetailsButton() {
  const e = useRecordContext<AuditEntry>();
  const [open, setOpen] = useState(false);
  if (!e) return null;
  return (
    <>
      <Button size="small" onClick={() => setOpen(true)} aria-label={`Details of ${actionLabel(e.action)} at ${formatDateTime(e.createdAt)}`}>
        Details
      </Button>
      <Dialog open={open} onClose={() => setOpen(false)} maxWidth="sm" fullWidth>
        <DialogTitle>{actionLabel(e.action)}</DialogTitle>
        <DialogContent>
          <EventDetails />
        </DialogContent>
        <DialogActions>
          <Button onClick={() => setOpen(false)}>Close</Button>
        </DialogActions>
      </Dialog>
    </>
  );
}

function EventDetails() {
  const e = useRecordContext<AuditEntry>();
  if (!e) return null;
  const rows = [
    { key: 'action code', value: e.action },
    { key: 'event id', value: e.id },
    { key: 'at', value: `${formatDateTime(e.createdAt)} (${e.createdAt})` },
    { key: 'actor id', value: e.actorId ?? '—' },
    { key: 'target id', value: e.targetId ?? '—' },
    ...detailRows(e.details),
  ];
  return (
    <Box sx={{ py: 1.5, px: 1, bgcolor: '#fbfaf7' }} data-testid="audit-details">
      <Box component="dl" sx={{ display: 'grid', gridTemplateColumns: 'minmax(120px, max-content) 1fr', columnGap: 3, rowGap: 0.5, m: 0 }}>
        {rows.map((r) => (
          <Box key={r.key} sx={{ display: 'contents' }}>
            <Typography component="dt" variant="caption" color="text.secondary" sx={{ fontFamily: monoFont, pt: '2px' }}>
              {r.key}
            </Typography>
            <Typography component="dd" variant="body2" sx={{ m: 0, fontFamily: monoFont, fontSize: '0.8rem', wordBreak: 'break-all' }}>
              {r.value}
            </Typography>
          </Box>
        ))}
      </Box>
    </Box>
  );
}

function NoEvents() {
  return (
    <EmptyState icon={ReceiptLongOutlined} title="Nothing recorded yet">
      Sign-ins, keys issued or revoked, role changes and invitations appear here as they happen.
    </EmptyState>
  );
}

export default function AuditListPage() {
  return (
    <Guarded resource="audit-events">
      <AuditList />
    </Guarded>
  );
}

function AuditList() {
  return (
    <>
      <PageHeader title="Audit log" lead="Every sign-in, key, role and setting change, with who did it and from where. Entries cannot be edited or removed." />
      <List resource="audit-events" title="Audit log" filters={filters} actions={false} empty={<NoEvents />} sort={{ field: 'createdAt', order: 'DESC' }} perPage={50} storeKey="audit.list">
        <DataTable bulkActionButtons={false} rowClick={false}>
          <DataTable.Col
            source="createdAt"
            label="When"
            render={(e: AuditEntry) => (
              <Box>
                <Typography variant="body2" sx={{ whiteSpace: 'nowrap' }}>
                  {formatDateTime(e.createdAt)}
                </Typography>
                <Typography variant="caption" color="text.secondary">
                  <RelativeTime value={e.createdAt} />
                </Typography>
              </Box>
            )}
          />
          <DataTable.Col label="Actor" disableSort field={ActorCell} />
          <DataTable.Col source="action" label="Action" field={ActionCell} />
          <DataTable.Col label="Target" disableSort field={TargetCell} />
          <DataTable.Col source="ip" label="From" disableSort render={(e: AuditEntry) => <span style={{ fontFamily: monoFont, fontSize: '0.8rem' }}>{e.ip ?? '—'}</span>} />
          <DataTable.Col label="Details" disableSort align="right" field={DetailsButton} />
        </DataTable>
      </List>
    </>
  );
}
