import AddOutlined from '@mui/icons-material/AddOutlined';
import Inventory2Outlined from '@mui/icons-material/Inventory2Outlined';
import { Box, Button, Typography } from '@mui/material';
import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import { AutocompleteInput, DataTable, List, ReferenceInput, SearchInput, SelectInput, TopToolbar, useCanAccess, useListContext, useRecordContext } from 'react-admin';
import { EmptyState } from '../common/EmptyState';
import { Guarded } from '../common/Guarded';
import { PageHeader } from '../common/PageHeader';
import { StatusChip } from '../common/StatusChip';
import { useNow } from '../common/useNow';
import { localToday } from '../devices/deviceRules';
import { formatDate } from '../format/dates';
import { SdsCaution } from '../shop/SdsCaution';
import { monoFont } from '../theme';
import { addDays, EXPIRING_SOON_DAYS, expiryView, PART_CHOICES, partLabel, type Lot } from './lotRules';

const day = (d: string | null) => (d ? formatDate(`${d}T12:00:00`) : '—');

function NewLotButton() {
  const { canAccess } = useCanAccess({ resource: 'lots', action: 'create' });
  if (!canAccess) return null;
  return (
    <Button component={Link} to="/lots/create" variant="contained" size="small" startIcon={<AddOutlined />} data-testid="new-lot">
      Record a lot
    </Button>
  );
}

function ExpiringSoonToggle() {
  const { filterValues, setFilters, displayedFilters } = useListContext();
  const today = localToday();
  const on = !!filterValues.expiresBefore;
  return (
    <Button
      size="small"
      variant={on ? 'contained' : 'outlined'}
      color="primary"
      onClick={() => {
        const { expiresBefore: _b, expiresAfter: _a, ...rest } = filterValues;
        setFilters(on ? rest : { ...rest, expiresBefore: addDays(today, EXPIRING_SOON_DAYS), expiresAfter: today }, displayedFilters, false);
      }}
      aria-pressed={on}
      sx={{ mr: 1 }}
      data-testid="expiring-soon"
    >
      Expiring within {EXPIRING_SOON_DAYS} days
    </Button>
  );
}

function ExpiryCell() {
  const lot = useRecordContext<Lot>();
  const now = useNow(60_000);
  if (!lot) return null;
  const v = expiryView(lot, localToday(now));
  return (
    <Box sx={{ display: 'flex', alignItems: 'center', gap: 1, whiteSpace: 'nowrap' }} data-expiry={v.state}>
      <Typography variant="body2">{day(lot.expiresOn)}</Typography>
      <StatusChip label={v.label} tone={v.tone} />
    </Box>
  );
}

function NoLots() {
  return (
    <EmptyState icon={Inventory2Outlined} title="No lots recorded" action={<NewLotButton />}>
      Record each drum or pail of part A, part B and pigment as it arrives, with the supplier&apos;s lot number and its
      expiry date. Batches name the lots they used, so a complaint can be traced back to the drum.
    </EmptyState>
  );
}

export default function LotListPage() {
  const filters = useMemo(
    () => [
      <SearchInput key="q" source="q" alwaysOn placeholder="Lot number" />,
      <SelectInput key="part" source="part" label="Part" choices={PART_CHOICES} emptyText="Any part" />,
      <ReferenceInput key="materialSystemId" source="materialSystemId" reference="material-systems" perPage={50} sort={{ field: 'name', order: 'ASC' }}>
        <AutocompleteInput label="Material system" optionText="name" filterToQuery={(q: string) => (q ? { q } : {})} sx={{ minWidth: 240 }} />
      </ReferenceInput>,
    ],
    [],
  );
  const now = useNow(60_000);
  const today = localToday(now);
  return (
    <Guarded resource="lots">
      <PageHeader title="Lots" lead="Component lots as received, soonest expiry first. An expired lot is flagged in every target that would use it." />
      <SdsCaution>Keep each lot&apos;s SDS where the drums are stored; see the material system&apos;s page.</SdsCaution>
      <List
        resource="lots"
        title="Lots"
        filters={filters}
        actions={
          <TopToolbar>
            <ExpiringSoonToggle />
            <NewLotButton />
          </TopToolbar>
        }
        empty={<NoLots />}
        sort={{ field: 'expiresOn', order: 'ASC' }}
        perPage={25}
        storeKey="lots.list"
      >
        <DataTable
          bulkActionButtons={false}
          rowClick={(id) => `/lots/${encodeURIComponent(String(id))}/trace`}
          rowSx={(l: Lot) => {
            const s = expiryView(l, today).state;
            return s === 'expired' ? { bgcolor: '#fdf2f1' } : s === 'soon' ? { bgcolor: '#fdf8ec' } : {};
          }}
        >
          <DataTable.Col source="lotNumber" label="Lot" render={(l: Lot) => <span style={{ fontFamily: monoFont, fontWeight: 500 }}>{l.lotNumber}</span>} />
          <DataTable.Col source="part" label="Part" render={(l: Lot) => partLabel(l.part)} />
          <DataTable.Col label="Material system" disableSort render={(l: Lot) => l.materialSystemName ?? <Typography variant="body2" color="text.secondary">Any (pigment)</Typography>} />
          <DataTable.Col source="receivedOn" label="Received" render={(l: Lot) => <span style={{ whiteSpace: 'nowrap' }}>{day(l.receivedOn)}</span>} />
          <DataTable.Col label="Opened" disableSort render={(l: Lot) => <span style={{ whiteSpace: 'nowrap' }}>{l.openedOn ? day(l.openedOn) : 'Sealed'}</span>} />
          <DataTable.Col source="expiresOn" label="Use by" field={ExpiryCell} />
        </DataTable>
      </List>
    </Guarded>
  );
}
