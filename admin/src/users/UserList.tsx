import Block from '@mui/icons-material/BlockOutlined';
import EditOutlined from '@mui/icons-material/EditOutlined';
import Restore from '@mui/icons-material/SettingsBackupRestoreOutlined';
import { Box, IconButton, Tooltip, Typography } from '@mui/material';
import { useState } from 'react';
import {
  Confirm,
  DataTable,
  List,
  NullableBooleanInput,
  SearchInput,
  SelectInput,
  TopToolbar,
  useCanAccess,
  useDataProvider,
  useGetIdentity,
  useNotify,
  useRecordContext,
  useRefresh,
} from 'react-admin';
import { roleChoices, roleLabel } from '../auth/roles';
import { Guarded } from '../common/Guarded';
import { PageHeader } from '../common/PageHeader';
import { RelativeTime } from '../common/RelativeTime';
import { StatusChip } from '../common/StatusChip';
import { formatDate } from '../format/dates';
import { InviteButton } from '../invitations/InviteDialog';
import type { User } from '../views/sdk';
import { UserEditDialog } from './UserEditDialog';

const filters = [
  <SearchInput key="q" source="q" alwaysOn placeholder="Name or e-mail" />,
  <SelectInput key="role" source="role" label="Role" choices={roleChoices} emptyText="Any role" />,
  <NullableBooleanInput key="disabled" source="disabled" label="Status" trueLabel="Disabled" falseLabel="Active" nullLabel="Any" />,
];

function Actions() {
  const { canAccess } = useCanAccess({ resource: 'users', action: 'edit' });
  return <TopToolbar>{canAccess ? <InviteButton /> : null}</TopToolbar>;
}

function PersonCell() {
  const u = useRecordContext<User>();
  if (!u) return null;
  return (
    <Box>
      <Typography variant="body2" sx={{ fontWeight: 500, color: u.disabled ? 'text.secondary' : 'text.primary' }}>
        {u.name}
      </Typography>
      <Typography variant="caption" color="text.secondary">
        {u.email}
      </Typography>
    </Box>
  );
}

function RowActions() {
  const user = useRecordContext<User>();
  const { identity } = useGetIdentity();
  const { canAccess } = useCanAccess({ resource: 'users', action: 'edit' });
  const dataProvider = useDataProvider();
  const notify = useNotify();
  const refresh = useRefresh();
  const [editing, setEditing] = useState(false);
  const [confirming, setConfirming] = useState(false);
  const [busy, setBusy] = useState(false);
  if (!user || !canAccess) return null;
  const self = identity?.id === user.id;
  const toggle = async () => {
    setBusy(true);
    try {
      await dataProvider.update<User>('users', { id: user.id, data: { ...user, disabled: !user.disabled }, previousData: user });
      notify(user.disabled ? `${user.name} can sign in again.` : `${user.name} is disabled and signed out everywhere.`, { type: 'success' });
      refresh();
    } catch (error) {
      notify((error as Error).message, { type: 'error' });
    } finally {
      setBusy(false);
      setConfirming(false);
    }
  };
  const selfNote = 'You cannot change your own access; ask another IT admin.';
  return (
    <Box sx={{ display: 'flex', justifyContent: 'flex-end' }} onClick={(e) => e.stopPropagation()}>
      <Tooltip title={self ? selfNote : 'Change name or role'}>
        <span>
          <IconButton size="small" aria-label={`Change role of ${user.name}`} onClick={() => setEditing(true)} disabled={self}>
            <EditOutlined fontSize="small" />
          </IconButton>
        </span>
      </Tooltip>
      <Tooltip title={self ? selfNote : user.disabled ? 'Enable' : 'Disable'}>
        <span>
          <IconButton
            size="small"
            aria-label={`${user.disabled ? 'Enable' : 'Disable'} ${user.name}`}
            onClick={() => setConfirming(true)}
            disabled={self}
            color={user.disabled ? 'primary' : 'default'}
          >
            {user.disabled ? <Restore fontSize="small" /> : <Block fontSize="small" />}
          </IconButton>
        </span>
      </Tooltip>
      {editing ? <UserEditDialog user={user} onClose={() => setEditing(false)} /> : null}
      <Confirm
        isOpen={confirming}
        loading={busy}
        title={user.disabled ? `Enable ${user.name}?` : `Disable ${user.name}?`}
        content={
          user.disabled
            ? 'They can sign in again with their password and keep their role.'
            : 'They are signed out at once and cannot sign in until enabled again. API keys they issued keep working; revoke those separately.'
        }
        confirm={user.disabled ? 'Enable' : 'Disable'}
        confirmColor={user.disabled ? 'primary' : 'warning'}
        onConfirm={toggle}
        onClose={() => setConfirming(false)}
      />
    </Box>
  );
}

export default function UserListPage() {
  return (
    <Guarded resource="users">
      <UserList />
    </Guarded>
  );
}

function UserList() {
  return (
    <>
      <PageHeader title="People" lead="Everyone who can sign in to this organization. The role decides what each person sees and may change." />
      <List
        resource="users"
        title="People"
        filters={filters}
        actions={<Actions />}
        sort={{ field: 'name', order: 'ASC' }}
        perPage={25}
        disableSyncWithLocation={false}
        storeKey="users.list"
      >
        <DataTable bulkActionButtons={false} rowClick={false} rowSx={(r: User) => (r.disabled ? { bgcolor: '#f8f7f3' } : {})}>
          <DataTable.Col source="name" label="Person" field={PersonCell} />
          <DataTable.Col source="role" label="Role" render={(u: User) => roleLabel(u.role)} />
          <DataTable.Col
            source="disabled"
            label="Status"
            disableSort
            render={(u: User) => (u.disabled ? <StatusChip tone="quiet" label="Disabled" /> : <StatusChip tone="good" label="Active" />)}
          />
          <DataTable.Col source="lastSignInAt" label="Last sign-in" render={(u: User) => <RelativeTime value={u.lastSignInAt} empty="Never" />} />
          <DataTable.Col source="createdAt" label="Added" render={(u: User) => formatDate(u.createdAt)} />
          <DataTable.Col label={<span className="visually-hidden">Actions</span>} disableSort align="right" field={RowActions} />
        </DataTable>
      </List>
    </>
  );
}
