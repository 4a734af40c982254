import Block from '@mui/icons-material/BlockOutlined';
import { IconButton, Tooltip, Typography } from '@mui/material';
import { useState } from 'react';
import {
  Confirm,
  DataTable,
  List,
  SearchInput,
  SelectInput,
  TopToolbar,
  useCanAccess,
  useDataProvider,
  useNotify,
  useRecordContext,
  useRefresh,
} from 'react-admin';
import type { PourgateDataProvider } from '../dataProvider';
import { roleChoices, roleLabel } from '../auth/roles';
import ForwardToInboxOutlined from '@mui/icons-material/ForwardToInboxOutlined';
import { EmptyState } from '../common/EmptyState';
import { Guarded } from '../common/Guarded';
import { PageHeader } from '../common/PageHeader';
import { RelativeTime } from '../common/RelativeTime';
import { StatusChip, type Tone } from '../common/StatusChip';
import type { Invitation, InvitationState } from '../views/sdk';
import { InviteButton } from './InviteDialog';

const STATE: Record<InvitationState, { label: string; tone: Tone }> = {
  pending: { label: 'Waiting', tone: 'info' },
  accepted: { label: 'Accepted', tone: 'good' },
  expired: { label: 'Expired', tone: 'quiet' },
  revoked: { label: 'Withdrawn', tone: 'bad' },
};

const filters = [
  <SearchInput key="email" source="email" alwaysOn placeholder="E-mail" />,
  <SelectInput key="role" source="role" label="Role" choices={roleChoices} emptyText="Any role" />,
];

function WithdrawButton() {
  const inv = useRecordContext<Invitation>();
  const { canAccess } = useCanAccess({ resource: 'invitations', action: 'edit' });
  const dataProvider = useDataProvider<PourgateDataProvider>();
  const notify = useNotify();
  const refresh = useRefresh();
  const [open, setOpen] = useState(false);
  const [busy, setBusy] = useState(false);
  if (!inv || !canAccess || inv.state !== 'pending') return null;
  const withdraw = async () => {
    setBusy(true);
    try {
      await dataProvider.revokeInvitation(inv.id);
      notify(`The invitation to ${inv.email} no longer works.`, { type: 'success' });
      refresh();
    } catch (error) {
      notify((error as Error).message, { type: 'error' });
    } finally {
      setBusy(false);
      setOpen(false);
    }
  };
  return (
    <>
      <Tooltip title="Withdraw the invitation">
        <IconButton size="small" aria-label={`Withdraw the invitation to ${inv.email}`} onClick={() => setOpen(true)}>
          <Block fontSize="small" />
        </IconButton>
      </Tooltip>
      <Confirm
        isOpen={open}
        loading={busy}
        title={`Withdraw the invitation to ${inv.email}?`}
        content="The link in their e-mail stops working at once. You can invite them again later."
        confirm="Withdraw"
        confirmColor="warning"
        onConfirm={withdraw}
        onClose={() => setOpen(false)}
      />
    </>
  );
}

function MaybeInvite() {
  const { canAccess } = useCanAccess({ resource: 'invitations', action: 'create' });
  return canAccess ? <InviteButton /> : null;
}

function Actions() {
  return (
    <TopToolbar>
      <MaybeInvite />
    </TopToolbar>
  );
}

function NoInvitations() {
  return (
    <EmptyState icon={ForwardToInboxOutlined} title="No invitations sent yet" action={<MaybeInvite />}>
      Invite colleagues by e-mail with the role they need. They choose their own name and password from the link.
    </EmptyState>
  );
}

function Outcome({ inv }: { inv: Invitation }) {
  if (inv.state === 'accepted') return <RelativeTime value={inv.acceptedAt} prefix="Accepted " />;
  if (inv.state === 'pending') return <RelativeTime value={inv.expiresAt} prefix="Link expires " />;
  if (inv.state === 'expired') return <RelativeTime value={inv.expiresAt} prefix="Expired " />;
  return <Typography variant="body2" color="text.secondary">Withdrawn</Typography>;
}

export default function InvitationListPage() {
  return (
    <Guarded resource="invitations">
      <InvitationList />
    </Guarded>
  );
}

function InvitationList() {
  return (
    <>
      <PageHeader title="Invitations" lead="Invitations sent by e-mail. Each link works once and only until it expires; send a new one if it lapsed." />
      <List resource="invitations" title="Invitations" filters={filters} actions={<Actions />} empty={<NoInvitations />} sort={{ field: 'createdAt', order: 'DESC' }} perPage={25} storeKey="invitations.list">
        <DataTable bulkActionButtons={false} rowClick={false}>
          <DataTable.Col source="email" label="E-mail" />
          <DataTable.Col source="role" label="Role" disableSort render={(i: Invitation) => roleLabel(i.role)} />
          <DataTable.Col
            source="state"
            label="State"
            disableSort
            render={(i: Invitation) => {
              const s = STATE[i.state] ?? { label: i.state, tone: 'quiet' as const };
              return <StatusChip label={s.label} tone={s.tone} />;
            }}
          />
          <DataTable.Col label="Invited by" disableSort render={(i: Invitation) => i.invitedBy?.name ?? '—'} />
          <DataTable.Col source="createdAt" label="Sent" render={(i: Invitation) => <RelativeTime value={i.createdAt} />} />
          <DataTable.Col label="Outcome" disableSort render={(i: Invitation) => <Outcome inv={i} />} />
          <DataTable.Col label={<span className="visually-hidden">Actions</span>} disableSort align="right" field={WithdrawButton} />
        </DataTable>
      </List>
    </>
  );
}
