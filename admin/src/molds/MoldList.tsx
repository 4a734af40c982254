import AddOutlined from '@mui/icons-material/AddOutlined';
import ViewInArOutlined from '@mui/icons-material/ViewInArOutlined';
import { Box, Button, Typography } from '@mui/material';
import { Link } from 'react-router-dom';
import { DataTable, List, SearchInput, TopToolbar, useCanAccess, useRecordContext } from 'react-admin';
import { EmptyState } from '../common/EmptyState';
import { Guarded } from '../common/Guarded';
import { PageHeader } from '../common/PageHeader';
import { formatNumber, formatSiAs } from '../format/quantities';
import { useDisplayUnits } from '../shop/useDisplayUnits';
import { monoFont } from '../theme';
import { measurementText, type Mold } from './moldRules';

function NewMoldButton() {
  const { canAccess } = useCanAccess({ resource: 'molds', action: 'create' });
  if (!canAccess) return null;
  return (
    <Button component={Link} to="/molds/create" variant="contained" size="small" startIcon={<AddOutlined />} data-testid="new-mold">
      New mold
    </Button>
  );
}

function NameCell() {
  const m = useRecordContext<Mold>();
  if (!m) return null;
  return (
    <Box>
      <Typography variant="body2" sx={{ fontWeight: 500 }}>
        {m.name}
      </Typography>
      {m.code ? (
        <Typography variant="caption" color="text.secondary" sx={{ fontFamily: monoFont }}>
          {m.code}
        </Typography>
      ) : null}
    </Box>
  );
}

function MeasuredCell() {
  const m = useRecordContext<Mold>();
  if (!m) return null;
  return (
    <Box>
      <Typography variant="body2">{measurementText(m.cavity)}</Typography>
      {m.inserts?.length ? (
        <Typography variant="caption" color="text.secondary">
          less {m.inserts.length} {m.inserts.length === 1 ? 'insert' : 'inserts'} ({formatSiAs(m.insertVolumeM3, 'L')})
        </Typography>
      ) : null}
    </Box>
  );
}

function VolumeCell({ field }: { field: 'cavityVolumeM3' | 'totalVolumeM3' }) {
  const m = useRecordContext<Mold>();
  const { system } = useDisplayUnits();
  if (!m) return null;
  return <span style={{ whiteSpace: 'nowrap' }}>{formatSiAs(m[field], system === 'imperial' ? 'in3' : 'L')}</span>;
}

function NoMolds() {
  return (
    <EmptyState icon={ViewInArOutlined} title="No molds yet" action={<NewMoldButton />}>
      A mold&apos;s cavity volume, times the target packed density, gives the foam mass of every pour. Measure it as a
      box or cylinder, by filling it with water, or enter it from CAD.
    </EmptyState>
  );
}

export default function MoldListPage() {
  const { canAccess: canEdit } = useCanAccess({ resource: 'molds', action: 'edit' });
  return (
    <Guarded resource="molds">
      <PageHeader title="Molds" lead="Cavity volumes as measured, less inserts, times the cavities filled from one mix." />
      <List resource="molds" title="Molds" filters={[<SearchInput key="q" source="q" alwaysOn placeholder="Mold name" />]} actions={<TopToolbar><NewMoldButton /></TopToolbar>} empty={<NoMolds />} sort={{ field: 'name', order: 'ASC' }} perPage={25} storeKey="molds.list">
        <DataTable bulkActionButtons={false} rowClick={canEdit ? 'edit' : false}>
          <DataTable.Col source="name" label="Mold" field={NameCell} />
          <DataTable.Col label="Measured as" disableSort field={MeasuredCell} />
          <DataTable.Col source="cavityVolumeM3" label="Foam volume, one cavity" render={() => <VolumeCell field="cavityVolumeM3" />} />
          <DataTable.Col label="Cavities" disableSort render={(m: Mold) => m.cavities} />
          <DataTable.Col source="totalVolumeM3" label="All cavities" render={() => <VolumeCell field="totalVolumeM3" />} />
          <DataTable.Col label="Pack factor" disableSort render={(m: Mold) => (m.defaultPackFactor === null ? <Typography variant="body2" color="text.secondary">—</Typography> : formatNumber(m.defaultPackFactor, { significant: 3 }))} />
        </DataTable>
      </List>
    </Guarded>
  );
}
