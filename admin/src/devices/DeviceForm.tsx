import { Alert, Box, Typography } from '@mui/material';
import { useMemo } from 'react';
import { BooleanInput, Create, DateInput, Edit, required, SaveButton, SelectInput, SimpleForm, TextInput, Toolbar, useRecordContext } from 'react-admin';
import { useWatch } from 'react-hook-form';
import { Guarded } from '../common/Guarded';
import { PageHeader } from '../common/PageHeader';
import { QuantityInput } from '../shop/QuantityInput';
import { useSaved } from '../shop/useSaved';
import { KIND_CHOICES, type Device } from './deviceRules';

const stationPattern = (v: unknown) => (!v || /^[A-Za-z0-9._-]+$/.test(String(v)) ? undefined : 'Letters, digits, dot, dash and underscore only');

function ScaleFields() {
  const kind = useWatch({ name: 'kind' });
  if (kind !== 'scale') return null;
  return (
    <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', md: '1fr 1fr' }, columnGap: 2, width: '100%' }}>
      <QuantityInput source="readability" label="Readability (d)" dimension="mass" units={['g', 'kg', 'lb', 'oz']} required helperText="The smallest step the display shows" />
      <QuantityInput source="capacity" label="Capacity (Max)" dimension="mass" units={['g', 'kg', 'lb', 'oz']} required />
    </Box>
  );
}

function Fields({ creating }: { creating: boolean }) {
  return (
    <>
      <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', md: '1fr 1fr' }, columnGap: 2, width: '100%' }}>
        <SelectInput source="kind" label="Kind" choices={[...KIND_CHOICES]} validate={required()} disabled={!creating} helperText={creating ? false : 'The kind is fixed once registered'} />
        <TextInput source="serial" label="Serial number" validate={required()} helperText="As printed on the device plate" />
        <TextInput source="name" label="Name" validate={required()} helperText="What people call it, e.g. “Bench scale 2”" />
        <TextInput source="stationCode" label="Station" validate={stationPattern} helperText="Short code of the pour station, e.g. S1 (created on first use)" />
      </Box>
      <ScaleFields />
      <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', md: '1fr 1fr' }, columnGap: 2, width: '100%' }}>
        <DateInput source="calibrationDue" label="Calibration due" helperText="Readings after this date are flagged" />
        {creating ? null : <BooleanInput source="retired" label="Retired (no longer in service)" />}
      </Box>
    </>
  );
}

/** What the edit form starts from: the readability and capacity in grams and kilograms. */
function formValues(d: Device) {
  const grams = (kg: number | null) => (kg === null ? { value: null, unit: 'g' } : kg < 1 ? { value: Number((kg * 1000).toPrecision(12)), unit: 'g' } : { value: kg, unit: 'kg' });
  return { ...d, stationCode: d.station?.code ?? d.stationCode ?? '', readability: grams(d.readabilityKg), capacity: d.capacityKg === null ? { value: null, unit: 'kg' } : { value: d.capacityKg, unit: 'kg' } };
}

function EditFormBody() {
  const record = useRecordContext<Device>();
  const values = useMemo(() => (record ? formValues(record) : undefined), [record]);
  if (!values) return null;
  return (
    <SimpleForm record={values} toolbar={<Toolbar><SaveButton label="Save device" /></Toolbar>} sx={{ maxWidth: 820 }}>
      {record?.calibrationOverdue ? (
        <Alert severity="error" variant="outlined" sx={{ mb: 2, width: '100%' }} data-testid="calibration-overdue-note">
          Calibration is overdue. Readings from this device are flagged until a new due date is recorded.
        </Alert>
      ) : null}
      <Fields creating={false} />
    </SimpleForm>
  );
}

export function DeviceEdit() {
  const saved = useSaved<Device>('devices', (d) => `${d.name} saved.`);
  return (
    <Guarded resource="devices" action="edit">
      <PageHeader title="Change a device" lead="Station, calibration date, readability and service state. Device keys bound to it keep working." />
      <Edit resource="devices" mutationMode="pessimistic" mutationOptions={saved} title="Device" actions={false}>
        <EditFormBody />
      </Edit>
    </Guarded>
  );
}

export function DeviceCreate() {
  const registered = useSaved<Device>('devices', (d) => `${d.name} (${d.serial}) is registered. Issue it a device key under API keys.`);
  return (
    <Guarded resource="devices" action="create">
      <PageHeader title="Register a device" lead="Then issue it a device key under API keys, so it can post readings." />
      <Create resource="devices" mutationOptions={registered} title="Register a device">
        <SimpleForm
          defaultValues={{ kind: 'scale', readability: { value: null, unit: 'g' }, capacity: { value: null, unit: 'kg' }, stationCode: '' }}
          toolbar={<Toolbar><SaveButton label="Register device" /></Toolbar>}
          sx={{ maxWidth: 820 }}
        >
          <Typography variant="body2" color="text.secondary" sx={{ mb: 2 }}>
            A scale&apos;s readability and capacity come from its data plate; Pourgate rounds targets to the readability and
            warns when a tolerance band is only a few divisions wide.
          </Typography>
          <Fields creating />
        </SimpleForm>
      </Create>
    </Guarded>
  );
}
