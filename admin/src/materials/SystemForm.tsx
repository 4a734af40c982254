import { Box, Typography } from '@mui/material';
import type { ReactNode } from 'react';
import { useMemo } from 'react';
import { CheckboxGroupInput, Create, Edit, NumberInput, RadioButtonGroupInput, required, SaveButton, SelectInput, SimpleForm, TextInput, Toolbar, useRecordContext } from 'react-admin';
import { Guarded } from '../common/Guarded';
import { PageHeader } from '../common/PageHeader';
import { QuantityInput } from '../shop/QuantityInput';
import { SdsCaution } from '../shop/SdsCaution';
import { useSaved } from '../shop/useSaved';
import { DOSE_BASIS_CHOICES, KIND_CHOICES, NEW_SYSTEM, PLACEMENT_CHOICES, RELEASE_CHOICES, systemFormValues, type MaterialSystem } from './systemRules';

function Group({ title, hint, children }: { title: string; hint?: string; children: ReactNode }) {
  return (
    <Box component="fieldset" sx={{ border: 0, p: 0, m: 0, mb: 2, width: '100%' }}>
      <Typography component="legend" variant="subtitle2" sx={{ fontWeight: 600, mb: 0.25 }}>
        {title}
      </Typography>
      {hint ? (
        <Typography variant="caption" color="text.secondary" component="p" sx={{ mb: 1 }}>
          {hint}
        </Typography>
      ) : null}
      <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', md: 'repeat(2, minmax(0, 1fr))', lg: 'repeat(3, minmax(0, 1fr))' }, columnGap: 2 }}>{children}</Box>
    </Box>
  );
}

function Window({ source, label, dimension = 'temperature' }: { source: string; label: string; dimension?: 'temperature' | 'time' | 'density' }) {
  return (
    <>
      <QuantityInput source={`${source}.min`} label={`${label}, lowest`} dimension={dimension} />
      <QuantityInput source={`${source}.max`} label={`${label}, highest`} dimension={dimension} />
      <span />
    </>
  );
}

function Fields({ revising }: { revising: boolean }) {
  return (
    <>
      <Group title="System">
        <TextInput source="name" label="Name" validate={required()} helperText="Your name for it, e.g. “Seat foam 28, slow”" />
        <SelectInput source="kind" label="Kind" choices={KIND_CHOICES} validate={required()} />
        {revising ? <TextInput source="changeNote" label="Why this revision" helperText="Kept with the revision, e.g. “supplier's new TDS”" /> : <span />}
      </Group>
      <Group title="Mix ratio" hint="As the supplier states it. For a volume ratio, the weight ratio follows from the specific gravities.">
        <RadioButtonGroupInput source="ratioBasis" label="Ratio is by" choices={[{ id: 'weight', name: 'Weight' }, { id: 'volume', name: 'Volume' }]} validate={required()} />
        <NumberInput source="ratio.a" label="Part A (parts)" validate={required()} min={0} />
        <NumberInput source="ratio.b" label="Part B (parts)" validate={required()} min={0} />
        <NumberInput source="specificGravityA" label="Specific gravity of A" validate={required()} step={0.01} min={0} />
        <NumberInput source="specificGravityB" label="Specific gravity of B" validate={required()} step={0.01} min={0} />
        <RadioButtonGroupInput source="isocyanatePart" label="Isocyanate side" choices={[{ id: 'A', name: 'Part A' }, { id: 'B', name: 'Part B' }]} validate={required()} />
        <NumberInput source="ratioTolerancePercent" label="Ratio tolerance ± %" helperText="5 % is common practice" min={0} />
        <NumberInput source="ratioTolerancePbw" label="Or ± parts by weight of B" helperText="As data sheets write 100 : 45 ± 2; replaces the percent" min={0} />
      </Group>
      <Group title="Pigment" hint="Pastes are dosed as a share of A+B, of the polyol side, or of the total; a paste may come pre-blended in one part.">
        <SelectInput source="pigmentDoseBasis" label="A pigment percent is of" choices={DOSE_BASIS_CHOICES} />
        <SelectInput source="pigmentPlacement" label="The pigment is" choices={PLACEMENT_CHOICES} helperText="Pre-blended: that part's target includes it" />
        <NumberInput source="pigmentCarrierHydroxylNumber" label="Carrier OH number (mg KOH/g)" helperText="Counted in the isocyanate index" min={0} />
      </Group>
      <Group title="Cup-test reactivity (ASTM D7487 terms)" hint="A cup test outside these holds its lots for new batches until an engineer releases them. The density band is at the reference temperature.">
        <Window source="creamTimeWindow" label="Cream time" dimension="time" />
        <Window source="riseTimeWindow" label="Rise (top of cup) time" dimension="time" />
        <Window source="tackFreeTimeWindow" label="Tack-free time" dimension="time" />
        <Window source="freeRiseDensityBand" label="Free-rise density" dimension="density" />
      </Group>
      <Group title="Before release" hint="Part A, part B and a separately weighed pigment are always needed; tick what else a batch must record.">
        <CheckboxGroupInput source="releaseRequires" label="Also required" choices={RELEASE_CHOICES} />
      </Group>
      <Group title="Free-rise density" hint="From the supplier's data or your own cup tests, at a stated component temperature.">
        <QuantityInput source="freeRiseDensity" label="Free-rise density" dimension="density" required />
        <QuantityInput source="freeRiseReferenceTemperature" label="At component temperature" dimension="temperature" required />
        <Box>
          <NumberInput source="freeRiseDensitySlope.value" label="Change per degree (usually negative)" helperText={false} />
          <SelectInput
            source="freeRiseDensitySlope.unit"
            label="Slope unit"
            choices={[{ id: 'kg/m3/degC', name: 'kg/m³ per °C' }, { id: 'lb/ft3/degF', name: 'lb/ft³ per °F' }]}
            helperText="Empty: fitted from cup tests"
          />
        </Box>
      </Group>
      <Group title="Working times" hint="Counted from the moment A meets B.">
        <QuantityInput source="potLife" label="Pot life" dimension="time" />
        <QuantityInput source="demoldTime" label="Demold time" dimension="time" />
        <QuantityInput source="fullCureTime" label="Full cure" dimension="time" />
      </Group>
      <Group title="Conditions" hint="Readings outside these windows are rejected with the measured value and the limit.">
        <Window source="componentTemperatureWindow" label="Components" />
        <Window source="moldTemperatureWindow" label="Mold" />
        <Window source="ambientTemperatureWindow" label="Room" />
        <NumberInput source="maxRelativeHumidity" label="Highest relative humidity %" min={0} max={100} />
        <NumberInput source="massTolerancePercent" label="Mass tolerance ± % (each part and the shot)" min={0} />
      </Group>
      <Group title="Limits and chemistry">
        <NumberInput source="maxPigmentPercent" label="Highest pigment, % of its dose basis" min={0} />
        <NumberInput source="maxPackFactor" label="Highest pack factor" min={1} />
        <QuantityInput source="exothermMassLimit" label="Largest single pour (exotherm)" dimension="mass" helperText="From the SDS/TDS; 2 kg when empty" />
        <NumberInput source="ncoPercent" label="%NCO of the isocyanate side" min={0} />
        <NumberInput source="hydroxylNumber" label="OH number of the polyol side (mg KOH/g)" min={0} />
        <NumberInput source="waterPbw" label="Water, parts per 100 of the polyol side" min={0} />
      </Group>
      <TextInput source="cautionsText" label="This system's own cautions" multiline minRows={2} fullWidth helperText="Shown after the standard cautions on every target and pour sheet" />
    </>
  );
}

function EditBody() {
  const record = useRecordContext<MaterialSystem>();
  const values = useMemo(() => (record ? systemFormValues(record) : undefined), [record]);
  if (!values) return null;
  return (
    <SimpleForm record={values} toolbar={<Toolbar><SaveButton label="Save revision" /></Toolbar>}>
      <Typography variant="body2" color="text.secondary" sx={{ mb: 2 }}>
        Now at revision {record!.revision}. Saving a change to any parameter makes revision {record!.revision + 1} current; a new name alone does not.
      </Typography>
      <Fields revising />
    </SimpleForm>
  );
}

export function SystemEdit() {
  const saved = useSaved<MaterialSystem>('material-systems', (s) => `${s.name} saved; revision ${s.revision} is current.`, 'show');
  return (
    <Guarded resource="material-systems" action="edit">
      <PageHeader title="Revise material system" />
      <SdsCaution />
      <Edit resource="material-systems" mutationMode="pessimistic" mutationOptions={saved} title="Revise material system" actions={false}>
        <EditBody />
      </Edit>
    </Guarded>
  );
}

export function SystemCreate() {
  const saved = useSaved<MaterialSystem>('material-systems', (s) => `${s.name} saved. Upload its SDS next.`, 'show');
  return (
    <Guarded resource="material-systems" action="create">
      <PageHeader title="New material system" lead="Take the figures from the supplier's TDS; upload the SDS once the system exists." />
      <SdsCaution />
      <Create resource="material-systems" mutationOptions={saved} title="New material system">
        <SimpleForm defaultValues={NEW_SYSTEM} toolbar={<Toolbar><SaveButton label="Save system" /></Toolbar>}>
          <Fields revising={false} />
        </SimpleForm>
      </Create>
    </Guarded>
  );
}
