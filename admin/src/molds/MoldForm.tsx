import AddOutlined from '@mui/icons-material/AddOutlined';
import { Box, Button, Typography } from '@mui/material';
import { useMemo } from 'react';
import { ArrayInput, Create, Edit, NumberInput, RadioButtonGroupInput, required, SaveButton, SimpleForm, SimpleFormIterator, TextInput, Toolbar, useRecordContext, useSimpleFormIterator, useSourceContext } from 'react-admin';
import { useWatch } from 'react-hook-form';
import { Guarded } from '../common/Guarded';
import { PageHeader } from '../common/PageHeader';
import { QuantityInput } from '../shop/QuantityInput';
import { useDisplayUnits } from '../shop/useDisplayUnits';
import { blankMeasurement, moldFormValues, type Mold } from './moldRules';
import { useSaved } from '../shop/useSaved';
import { VolumeReadout } from './VolumeReadout';
import { MEASUREMENT_FIELDS, MEASUREMENT_KINDS, type MeasurementKind } from './volumeHelper';

const kindChoices = MEASUREMENT_KINDS.map((k) => ({ id: k.id, name: k.name }));

function MeasurementInputs({ source, label, defaultKind }: { source: string; label: string; defaultKind?: MeasurementKind }) {
  const at = (f: string) => (source ? `${source}.${f}` : f);
  // inputs take sources relative to their array row; watching needs the full path
  const sourceContext = useSourceContext();
  const kind = useWatch({ name: sourceContext ? sourceContext.getSource(at('kind')) : at('kind') }) as MeasurementKind | undefined;
  const hint = MEASUREMENT_KINDS.find((k) => k.id === kind)?.hint;
  return (
    <Box sx={{ width: '100%' }}>
      <RadioButtonGroupInput source={at('kind')} label={`${label}: measured as`} choices={kindChoices} validate={required()} helperText={hint ?? false} defaultValue={defaultKind} />
      <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', md: 'repeat(3, minmax(0, 1fr))' }, columnGap: 2 }}>
        {kind
          ? MEASUREMENT_FIELDS[kind].map((f) => (
              <QuantityInput
                key={`${kind}-${f.field}`}
                source={at(f.field)}
                label={f.label}
                dimension={f.dimension}
                required
                helperText={f.field === 'waterTemperature' ? '0–40 °C (32–104 °F)' : undefined}
              />
            ))
          : null}
      </Box>
    </Box>
  );
}

function Fields() {
  return (
    <>
      <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', md: '2fr 1fr' }, columnGap: 2, width: '100%' }}>
        <TextInput source="name" label="Name" validate={required()} helperText="e.g. “Seat cushion, 2-up”" />
        <TextInput source="code" label="Code" helperText="Short, unique, e.g. SEAT-01" />
      </Box>
      <Typography variant="subtitle2" sx={{ fontWeight: 600, mt: 1 }}>
        Cavity
      </Typography>
      <Typography variant="caption" color="text.secondary" sx={{ mb: 1 }}>
        One cavity, inside dimensions. A water fill made with the inserts in place already leaves them out.
      </Typography>
      <MeasurementInputs source="cavity" label="Cavity" />
      <ArrayInput source="inserts" label="Inserts, cores and embedded parts (per cavity)">
        <SimpleFormIterator inline={false} disableReordering addButton={<AddInsertButton />} getItemLabel={(i: number) => `Insert ${i + 1}`} sx={{ '& .RaSimpleFormIterator-line': { borderBottom: '1px dashed', borderColor: 'divider', pb: 1 } }}>
          <InsertInputs />
        </SimpleFormIterator>
      </ArrayInput>
      <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', md: '1fr 1fr' }, columnGap: 2, width: '100%' }}>
        <NumberInput source="cavities" label="Cavities filled from one mix" min={1} step={1} validate={required()} />
        <NumberInput source="defaultPackFactor" label="Default pack factor" step={0.1} min={0} helperText="Used when a batch gives no density; above 1 packs the mold" />
      </Box>
      <VolumeReadout />
      <TextInput source="notes" label="Notes" multiline minRows={2} fullWidth />
    </>
  );
}

function AddInsertButton() {
  const { add } = useSimpleFormIterator();
  return (
    <Button size="small" startIcon={<AddOutlined />} onClick={() => add()} data-testid="add-insert">
      Add an insert
    </Button>
  );
}

/** One insert row; a fresh row starts as a known volume (the usual case: a core from CAD). */
function InsertInputs() {
  return <MeasurementInputs source="" label="Insert" defaultKind="entered" />;
}

function EditBody() {
  const record = useRecordContext<Mold>();
  const { system } = useDisplayUnits();
  const values = useMemo(() => (record ? moldFormValues(record, system === 'metric') : undefined), [record, system]);
  if (!values) return null;
  return (
    <SimpleForm record={values} toolbar={<Toolbar><SaveButton label="Save mold" /></Toolbar>} sx={{ maxWidth: 980 }}>
      <Fields />
    </SimpleForm>
  );
}

export function MoldEdit() {
  const saved = useSaved<Mold>('molds', (m) => `${m.name} saved.`);
  return (
    <Guarded resource="molds" action="edit">
      <PageHeader title="Change a mold" lead="Batches keep the volume they were computed with; a change here applies to new batches." />
      <Edit resource="molds" mutationMode="pessimistic" mutationOptions={saved} title="Mold" actions={false}>
        <EditBody />
      </Edit>
    </Guarded>
  );
}

export function MoldCreate() {
  const saved = useSaved<Mold>('molds', (m) => `${m.name} added.`);
  const { system } = useDisplayUnits();
  const metric = system === 'metric';
  return (
    <Guarded resource="molds" action="create">
      <PageHeader title="New mold" lead="Measure the cavity one of four ways; the volume shows as you type and the API stores it on save." />
      <Create resource="molds" mutationOptions={saved} title="New mold">
        <SimpleForm defaultValues={{ cavity: blankMeasurement('box', metric), inserts: [], cavities: 1, defaultPackFactor: null }} toolbar={<Toolbar><SaveButton label="Save mold" /></Toolbar>} sx={{ maxWidth: 980 }}>
          <Fields />
        </SimpleForm>
      </Create>
    </Guarded>
  );
}
