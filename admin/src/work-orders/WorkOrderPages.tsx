import AddOutlined from '@mui/icons-material/AddOutlined';
import AssignmentOutlined from '@mui/icons-material/AssignmentOutlined';
import { Box, Button, Typography } from '@mui/material';
import { Link } from 'react-router-dom';
import {
  AutocompleteInput,
  Create,
  DataTable,
  DateInput,
  Edit,
  List,
  NumberInput,
  ReferenceInput,
  required,
  SaveButton,
  SearchInput,
  SelectInput,
  SimpleForm,
  TextInput,
  Toolbar,
  TopToolbar,
  useCanAccess,
  useRecordContext,
} from 'react-admin';
import { EmptyState } from '../common/EmptyState';
import { Guarded } from '../common/Guarded';
import { PageHeader } from '../common/PageHeader';
import { StatusChip, type Tone } from '../common/StatusChip';
import { localToday } from '../devices/deviceRules';
import { formatDate } from '../format/dates';
import { useSaved } from '../shop/useSaved';
import { monoFont } from '../theme';
import type { WorkOrder } from '../views/sdk';

export type { WorkOrder };

export const STATE_CHOICES = [
  { id: 'open', name: 'Open' },
  { id: 'in_progress', name: 'In production' },
  { id: 'done', name: 'Done' },
  { id: 'cancelled', name: 'Cancelled' },
];
const STATE_TONE: Record<string, Tone> = { open: 'info', in_progress: 'caution', done: 'good', cancelled: 'quiet' };

function NewOrderButton() {
  const { canAccess } = useCanAccess({ resource: 'work-orders', action: 'create' });
  if (!canAccess) return null;
  return (
    <Button component={Link} to="/work-orders/create" variant="contained" size="small" startIcon={<AddOutlined />}>
      New work order
    </Button>
  );
}

function OrderCell() {
  const w = useRecordContext<WorkOrder>();
  if (!w) return null;
  return (
    <Box>
      <Typography variant="body2" sx={{ fontFamily: monoFont, fontWeight: 500 }}>
        {w.externalRef}
      </Typography>
      {w.partNumber ? (
        <Typography variant="caption" color="text.secondary">
          part {w.partNumber}
        </Typography>
      ) : null}
    </Box>
  );
}

function DueCell() {
  const w = useRecordContext<WorkOrder>();
  if (!w) return null;
  if (!w.dueOn) return <Typography variant="body2" color="text.secondary">—</Typography>;
  const late = w.dueOn < localToday() && (w.state === 'open' || w.state === 'in_progress');
  return (
    <Box sx={{ display: 'flex', gap: 1, alignItems: 'center', whiteSpace: 'nowrap' }}>
      <span>{formatDate(`${w.dueOn}T12:00:00`)}</span>
      {late ? <StatusChip label="Late" tone="bad" /> : null}
    </Box>
  );
}

const filters = [
  <SearchInput key="q" source="q" alwaysOn placeholder="Order reference" />,
  <SelectInput key="state" source="state" label="State" choices={STATE_CHOICES} emptyText="Any state" alwaysOn />,
  <ReferenceInput key="moldId" source="moldId" reference="molds" perPage={50} sort={{ field: 'name', order: 'ASC' }}>
    <AutocompleteInput label="Mold" optionText="name" filterToQuery={(q: string) => (q ? { q } : {})} sx={{ minWidth: 220 }} />
  </ReferenceInput>,
];

export function WorkOrderList() {
  return (
    <Guarded resource="work-orders">
      <PageHeader
        title="Work orders"
        lead="Orders usually arrive from the ERP (idempotent on its reference); engineers can add and update them here. Batches are planned against them."
      />
      <List
        resource="work-orders"
        title="Work orders"
        filters={filters}
        actions={<TopToolbar><NewOrderButton /></TopToolbar>}
        empty={
          <EmptyState icon={AssignmentOutlined} title="No work orders yet" action={<NewOrderButton />}>
            The ERP posts work orders with an integration key scoped work-orders:write; each names the parts to make, the
            mold and the material system.
          </EmptyState>
        }
        sort={{ field: 'dueOn', order: 'ASC' }}
        perPage={25}
        storeKey="work-orders.list"
      >
        <DataTable bulkActionButtons={false} rowClick="show" rowSx={(w: WorkOrder) => (w.state === 'cancelled' || w.state === 'done' ? { opacity: 0.7 } : {})}>
          <DataTable.Col source="externalRef" label="Order" field={OrderCell} />
          <DataTable.Col label="Mold" disableSort render={(w: WorkOrder) => w.moldName ?? '—'} />
          <DataTable.Col label="Material system" disableSort render={(w: WorkOrder) => w.materialSystemName ?? '—'} />
          <DataTable.Col source="quantity" label="Parts" align="right" />
          <DataTable.Col source="dueOn" label="Due" field={DueCell} />
          <DataTable.Col source="state" label="State" render={(w: WorkOrder) => <StatusChip label={STATE_CHOICES.find((c) => c.id === w.state)?.name ?? w.state} tone={STATE_TONE[w.state] ?? 'quiet'} />} />
          <DataTable.Col label="From" disableSort render={(w: WorkOrder) => <Typography variant="body2" color="text.secondary">{w.createdBy ?? '—'}</Typography>} />
        </DataTable>
      </List>
    </Guarded>
  );
}

function Fields({ creating }: { creating: boolean }) {
  return (
    <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', md: '1fr 1fr' }, columnGap: 2, width: '100%' }}>
      <TextInput source="externalRef" label="Order reference" validate={required()} disabled={!creating} helperText={creating ? 'The ERP’s reference, unique in your shop' : 'The reference cannot change'} />
      <TextInput source="partNumber" label="Part number" />
      <ReferenceInput source="moldId" reference="molds" perPage={50} sort={{ field: 'name', order: 'ASC' }}>
        <AutocompleteInput label="Mold" optionText="name" filterToQuery={(q: string) => (q ? { q } : {})} />
      </ReferenceInput>
      <ReferenceInput source="materialSystemId" reference="material-systems" perPage={50} sort={{ field: 'name', order: 'ASC' }}>
        <AutocompleteInput label="Material system" optionText="name" filterToQuery={(q: string) => (q ? { q } : {})} />
      </ReferenceInput>
      <NumberInput source="quantity" label="Parts to make" validate={required()} min={1} step={1} />
      <DateInput source="dueOn" label="Due" />
      <SelectInput source="state" label="State" choices={STATE_CHOICES} validate={required()} />
      <span />
      <TextInput source="notes" label="Notes" multiline minRows={2} sx={{ gridColumn: '1 / -1' }} />
    </Box>
  );
}

export function WorkOrderCreate() {
  const saved = useSaved<WorkOrder>('work-orders', (w) => `Work order ${w.externalRef} saved.`);
  return (
    <Guarded resource="work-orders" action="create">
      <PageHeader title="New work order" lead="Posting the same reference again with the same details returns this order; different details are refused." />
      <Create resource="work-orders" mutationOptions={saved} title="New work order">
        <SimpleForm defaultValues={{ state: 'open', quantity: 1 }} toolbar={<Toolbar><SaveButton label="Save work order" /></Toolbar>} sx={{ maxWidth: 820 }}>
          <Fields creating />
        </SimpleForm>
      </Create>
    </Guarded>
  );
}

export function WorkOrderEdit() {
  const saved = useSaved<WorkOrder>('work-orders', (w) => `Work order ${w.externalRef} saved.`);
  return (
    <Guarded resource="work-orders" action="edit">
      <PageHeader title="Change a work order" lead="The ERP hears of every change (work_order.changed)." />
      <Edit resource="work-orders" mutationMode="pessimistic" mutationOptions={saved} title="Work order" actions={false}>
        <SimpleForm toolbar={<Toolbar><SaveButton label="Save work order" /></Toolbar>} sx={{ maxWidth: 820 }}>
          <Fields creating={false} />
        </SimpleForm>
      </Edit>
    </Guarded>
  );
}
