import AddOutlined from '@mui/icons-material/AddOutlined';
import ScienceOutlined from '@mui/icons-material/ScienceOutlined';
import { Box, Button, Typography } from '@mui/material';
import { Link } from 'react-router-dom';
import { DataTable, List, SearchInput, SelectInput, TopToolbar, useCanAccess, useRecordContext } from 'react-admin';
import { EmptyState } from '../common/EmptyState';
import { Guarded } from '../common/Guarded';
import { PageHeader } from '../common/PageHeader';
import { RelativeTime } from '../common/RelativeTime';
import { StatusChip } from '../common/StatusChip';
import { SdsCaution } from '../shop/SdsCaution';
import { formatSiAs, formatSeconds } from '../format/quantities';
import { useDisplayUnits } from '../shop/useDisplayUnits';
import { KIND_CHOICES, kindLabel, ratioLabel, type MaterialSystem } from './systemRules';

const filters = [
  <SearchInput key="q" source="q" alwaysOn placeholder="System name" />,
  <SelectInput key="kind" source="kind" label="Kind" choices={KIND_CHOICES} emptyText="Any kind" />,
];

export function NewSystemButton() {
  const { canAccess } = useCanAccess({ resource: 'material-systems', action: 'create' });
  if (!canAccess) return null;
  return (
    <Button component={Link} to="/material-systems/create" variant="contained" size="small" startIcon={<AddOutlined />}>
      New material system
    </Button>
  );
}

function NameCell() {
  const s = useRecordContext<MaterialSystem>();
  if (!s) return null;
  return (
    <Box>
      <Typography variant="body2" sx={{ fontWeight: 500 }}>
        {s.name}
      </Typography>
      <Typography variant="caption" color="text.secondary">
        {kindLabel(s.kind)} · isocyanate is part {s.isocyanatePart}
      </Typography>
    </Box>
  );
}

function DensityCell() {
  const s = useRecordContext<MaterialSystem>();
  const { units, system } = useDisplayUnits();
  if (!s) return null;
  return (
    <Box sx={{ whiteSpace: 'nowrap' }}>
      <Typography variant="body2">{formatSiAs(s.freeRiseDensityKgM3, units.density)}</Typography>
      <Typography variant="caption" color="text.secondary">
        at {formatSiAs(s.freeRiseReferenceTemperatureC, system === 'imperial' ? 'degF' : 'degC', { significant: 3 })}
      </Typography>
    </Box>
  );
}

function TimesCell() {
  const s = useRecordContext<MaterialSystem>();
  if (!s) return null;
  return (
    <Typography variant="body2" sx={{ whiteSpace: 'nowrap' }}>
      {formatSeconds(s.potLifeS)} <Box component="span" sx={{ color: 'text.secondary' }}>/</Box> {formatSeconds(s.demoldTimeS)}
    </Typography>
  );
}

function DocsCell() {
  const s = useRecordContext<MaterialSystem>();
  if (!s) return null;
  return s.documents.sds > 0 ? <StatusChip label="SDS on file" tone="good" /> : <StatusChip label="No SDS yet" tone="caution" title="Upload the supplier's SDS so everyone handling the parts can reach it" />;
}

function NoSystems() {
  return (
    <EmptyState icon={ScienceOutlined} title="No material systems yet" action={<NewSystemButton />}>
      A material system is one two-part formulation: its mix ratio, the specific gravities of A and B, free-rise
      density and working times. Batch targets and the judging of readings start from it.
    </EmptyState>
  );
}

export default function SystemListPage() {
  return (
    <Guarded resource="material-systems">
      <PageHeader
        title="Material systems"
        lead="Two-part formulations at their current revision. A change to any parameter writes a new revision; batches keep the one they were computed with."
      />
      <SdsCaution>Each system&apos;s page links its SDS and TDS.</SdsCaution>
      <List resource="material-systems" title="Material systems" filters={filters} actions={<TopToolbar><NewSystemButton /></TopToolbar>} empty={<NoSystems />} sort={{ field: 'name', order: 'ASC' }} perPage={25} storeKey="material-systems.list">
        <DataTable bulkActionButtons={false} rowClick="show">
          <DataTable.Col source="name" label="System" field={NameCell} />
          <DataTable.Col label="Mix ratio A : B" disableSort render={(s: MaterialSystem) => <span style={{ whiteSpace: 'nowrap' }}>{ratioLabel(s)} ± {s.ratioTolerancePercent} %</span>} />
          <DataTable.Col label="Free-rise density" disableSort field={DensityCell} />
          <DataTable.Col label="Pot life / demold" disableSort field={TimesCell} />
          <DataTable.Col source="revision" label="Revision" render={(s: MaterialSystem) => <span>rev. {s.revision}</span>} />
          <DataTable.Col label="SDS" disableSort field={DocsCell} />
          <DataTable.Col source="updatedAt" label="Changed" render={(s: MaterialSystem) => <RelativeTime value={s.revisedAt ?? s.updatedAt} />} />
        </DataTable>
      </List>
    </Guarded>
  );
}
