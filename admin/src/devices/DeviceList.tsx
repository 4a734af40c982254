import AddOutlined from '@mui/icons-material/AddOutlined';
import ScaleOutlined from '@mui/icons-material/ScaleOutlined';
import { Box, Button, Typography } from '@mui/material';
import { Link } from 'react-router-dom';
import { DataTable, List, NullableBooleanInput, SearchInput, SelectInput, TopToolbar, useCanAccess, useRecordContext } from 'react-admin';
import { EmptyState } from '../common/EmptyState';
import { Guarded } from '../common/Guarded';
import { PageHeader } from '../common/PageHeader';
import { StatusChip } from '../common/StatusChip';
import { useNow } from '../common/useNow';
import { formatDate } from '../format/dates';
import { formatSiAs } from '../format/quantities';
import { monoFont } from '../theme';
import { calibrationView, KIND_CHOICES, kindLabel, localToday, type Device } from './deviceRules';

const filters = [
  <SearchInput key="q" source="q" alwaysOn placeholder="Device name" />,
  <SelectInput key="kind" source="kind" label="Kind" choices={[...KIND_CHOICES]} emptyText="Any kind" />,
  <NullableBooleanInput key="retired" source="retired" label="In service" trueLabel="Retired" falseLabel="In service" nullLabel="Any" />,
];

function RegisterButton() {
  const { canAccess } = useCanAccess({ resource: 'devices', action: 'create' });
  if (!canAccess) return null;
  return (
    <Button component={Link} to="/devices/create" variant="contained" size="small" startIcon={<AddOutlined />} data-testid="register-device">
      Register a device
    </Button>
  );
}

function NoDevices() {
  return (
    <EmptyState icon={ScaleOutlined} title="No devices registered" action={<RegisterButton />}>
      Register each bench scale, thermometer and logger that posts readings. Scales need their readability (the
      division d) and capacity, so targets can be rounded to what the scale can show and small batches flagged.
    </EmptyState>
  );
}

function DeviceCell() {
  const d = useRecordContext<Device>();
  if (!d) return null;
  return (
    <Box>
      <Typography variant="body2" sx={{ fontWeight: 500 }}>
        {d.name}
      </Typography>
      <Typography variant="caption" color="text.secondary" sx={{ fontFamily: monoFont }}>
        {d.serial}
      </Typography>
    </Box>
  );
}

function RangeCell() {
  const d = useRecordContext<Device>();
  if (!d) return null;
  if (d.kind !== 'scale' || d.readabilityKg === null) return <Typography variant="body2" color="text.secondary">—</Typography>;
  // a division below 1 g reads better in grams; the capacity in kilograms
  const dUnit = d.readabilityKg < 1 ? 'g' : 'kg';
  return (
    <Typography variant="body2" sx={{ whiteSpace: 'nowrap' }}>
      d = {formatSiAs(d.readabilityKg, dUnit)} · max {formatSiAs(d.capacityKg, 'kg')}
    </Typography>
  );
}

function CalibrationCell() {
  const d = useRecordContext<Device>();
  const now = useNow(60_000);
  if (!d) return null;
  const v = calibrationView(d, localToday(now));
  if (!v) return <Typography variant="body2" color="text.secondary">Not recorded</Typography>;
  return (
    <Box sx={{ display: 'flex', alignItems: 'center', gap: 1, whiteSpace: 'nowrap' }} data-testid={v.overdue ? 'calibration-overdue' : undefined}>
      <Typography variant="body2">{formatDate(`${d.calibrationDue}T12:00:00`)}</Typography>
      <StatusChip label={v.label} tone={v.tone} />
    </Box>
  );
}

export default function DeviceListPage() {
  const { canAccess: canEdit } = useCanAccess({ resource: 'devices', action: 'edit' });
  return (
    <Guarded resource="devices">
      <PageHeader
        title="Devices"
        lead="Bench scales, thermometers, hygrometers and loggers that post readings, and the station each sits at. A scale past its calibration date still posts, but every reading from it is flagged."
      />
      <List resource="devices" title="Devices" filters={filters} actions={<TopToolbar><RegisterButton /></TopToolbar>} empty={<NoDevices />} sort={{ field: 'name', order: 'ASC' }} perPage={25} storeKey="devices.list">
        <DataTable
          bulkActionButtons={false}
          rowClick={canEdit ? 'edit' : false}
          rowSx={(d: Device) => (d.retired ? { opacity: 0.6 } : d.calibrationOverdue ? { bgcolor: '#fdf2f1' } : {})}
        >
          <DataTable.Col source="name" label="Device" field={DeviceCell} />
          <DataTable.Col source="kind" label="Kind" render={(d: Device) => kindLabel(d.kind)} />
          <DataTable.Col label="Station" disableSort render={(d: Device) => (d.station ? <span style={{ fontFamily: monoFont }}>{d.station.code}</span> : <Typography variant="body2" color="text.secondary">—</Typography>)} />
          <DataTable.Col label="Readability · capacity" disableSort field={RangeCell} />
          <DataTable.Col source="calibrationDue" label="Calibration due" field={CalibrationCell} />
          <DataTable.Col label="State" disableSort render={(d: Device) => (d.retired ? <StatusChip label="Retired" tone="quiet" /> : <StatusChip label="In service" tone="info" />)} />
        </DataTable>
      </List>
    </Guarded>
  );
}
