import AddOutlined from '@mui/icons-material/AddOutlined';
import LocalDrinkOutlined from '@mui/icons-material/LocalDrinkOutlined';
import { Box, Button, Typography } from '@mui/material';
import { Link } from 'react-router-dom';
import {
  AutocompleteInput,
  Create,
  DataTable,
  DateTimeInput,
  List,
  ReferenceInput,
  required,
  SaveButton,
  SimpleForm,
  TextInput,
  Toolbar,
  TopToolbar,
  useCanAccess,
  useRecordContext,
} from 'react-admin';
import { useWatch } from 'react-hook-form';
import { EmptyState } from '../common/EmptyState';
import { Guarded } from '../common/Guarded';
import { PageHeader } from '../common/PageHeader';
import { formatDateTime } from '../format/dates';
import { QuantityInput } from '../shop/QuantityInput';
import { SdsCaution } from '../shop/SdsCaution';
import { formatSiAs, formatSeconds } from '../format/quantities';
import { useDisplayUnits } from '../shop/useDisplayUnits';
import { useSaved } from '../shop/useSaved';
import type { CupTest } from '../views/sdk';

export type { CupTest };

function NewCupButton() {
  const { canAccess } = useCanAccess({ resource: 'qc-cup-tests', action: 'create' });
  if (!canAccess) return null;
  return (
    <Button component={Link} to="/qc-cup-tests/create" variant="contained" size="small" startIcon={<AddOutlined />}>
      Record a cup test
    </Button>
  );
}

function TemperatureCell() {
  const c = useRecordContext<CupTest>();
  const { system } = useDisplayUnits();
  if (!c) return null;
  const unit = system === 'imperial' ? 'degF' : 'degC';
  return (
    <span style={{ whiteSpace: 'nowrap' }}>
      A {formatSiAs(c.componentTemperatureAC, unit, { significant: 3 })} · B {formatSiAs(c.componentTemperatureBC, unit, { significant: 3 })}
    </span>
  );
}

function TimesCell() {
  const c = useRecordContext<CupTest>();
  if (!c) return null;
  return (
    <span style={{ whiteSpace: 'nowrap' }}>
      {formatSeconds(c.creamTimeS)} / {formatSeconds(c.topOfCupTimeS)} / {formatSeconds(c.tackFreeTimeS)}
    </span>
  );
}

function DensityCell() {
  const c = useRecordContext<CupTest>();
  const { units } = useDisplayUnits();
  if (!c) return null;
  return <strong style={{ fontWeight: 500, whiteSpace: 'nowrap' }}>{formatSiAs(c.freeRiseDensityKgM3, units.density)}</strong>;
}

const filters = [
  <ReferenceInput key="materialSystemId" source="materialSystemId" reference="material-systems" perPage={50} sort={{ field: 'name', order: 'ASC' }} alwaysOn>
    <AutocompleteInput label="Material system" optionText="name" filterToQuery={(q: string) => (q ? { q } : {})} sx={{ minWidth: 240 }} />
  </ReferenceInput>,
];

export function CupTestList() {
  return (
    <Guarded resource="qc-cup-tests">
      <PageHeader
        title="Cup tests"
        lead="Free-rise cup tests in the terms of ASTM D7487: cream, top-of-cup and tack-free times from when A meets B, and free-rise density. The latest tests of a system give its expected density at each component temperature."
      />
      <List
        resource="qc-cup-tests"
        title="Cup tests"
        filters={filters}
        actions={<TopToolbar><NewCupButton /></TopToolbar>}
        empty={
          <EmptyState icon={LocalDrinkOutlined} title="No cup tests yet" action={<NewCupButton />}>
            A cup test checks a lot pairing before production: mix a small shot in a cup, time the rise, cut it level and
            weigh it. Three or more at different temperatures let Pourgate fit density against temperature.
          </EmptyState>
        }
        sort={{ field: 'testedAt', order: 'DESC' }}
        perPage={25}
        storeKey="qc-cup-tests.list"
      >
        <DataTable bulkActionButtons={false} rowClick={false}>
          <DataTable.Col source="testedAt" label="Tested" render={(c: CupTest) => <span style={{ whiteSpace: 'nowrap' }}>{formatDateTime(c.testedAt)}</span>} />
          <DataTable.Col label="Material system" disableSort render={(c: CupTest) => <span>{c.materialSystemName}{c.materialSystemRevision ? <Typography component="span" variant="caption" color="text.secondary"> rev. {c.materialSystemRevision}</Typography> : null}</span>} />
          <DataTable.Col label="Components" disableSort field={TemperatureCell} />
          <DataTable.Col label="Cream / top of cup / tack-free" disableSort field={TimesCell} />
          <DataTable.Col source="freeRiseDensityKgM3" label="Free-rise density" field={DensityCell} />
          <DataTable.Col label="By" disableSort render={(c: CupTest) => <Typography variant="body2" color="text.secondary">{c.createdBy ?? '—'}</Typography>} />
        </DataTable>
      </List>
    </Guarded>
  );
}

function LotInput({ part }: { part: 'A' | 'B' }) {
  const system = useWatch({ name: 'materialSystemId' }) as string | undefined;
  return (
    <ReferenceInput source={`lot${part}Id`} reference="lots" filter={system ? { part, materialSystemId: system } : { part }} perPage={50} sort={{ field: 'expiresOn', order: 'ASC' }}>
      <AutocompleteInput label={`Part ${part} lot`} optionText="lotNumber" filterToQuery={(q: string) => (q ? { q } : {})} helperText={system ? 'Lots of this system' : 'Pick the system first to narrow the list'} />
    </ReferenceInput>
  );
}

export function CupTestCreate() {
  const saved = useSaved<CupTest>('qc-cup-tests', (c) => `Cup test of ${c.materialSystemName} recorded.`);
  return (
    <Guarded resource="qc-cup-tests" action="create">
      <PageHeader title="Record a cup test" lead="Times from the moment A meets B; density of the cut, levelled cup." />
      <SdsCaution>Mix cup tests under extraction, as for production pours.</SdsCaution>
      <Create resource="qc-cup-tests" mutationOptions={saved} title="Record a cup test">
        <SimpleForm
          defaultValues={{ testedAt: new Date(), creamTime: { value: null, unit: 's' }, topOfCupTime: { value: null, unit: 's' }, tackFreeTime: { value: null, unit: 's' } }}
          toolbar={<Toolbar><SaveButton label="Save cup test" /></Toolbar>}
          sx={{ maxWidth: 980 }}
        >
          <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', md: 'repeat(2, minmax(0, 1fr))' }, columnGap: 3, width: '100%' }}>
            <ReferenceInput source="materialSystemId" reference="material-systems" perPage={50} sort={{ field: 'name', order: 'ASC' }}>
              <AutocompleteInput label="Material system" optionText="name" validate={required()} filterToQuery={(q: string) => (q ? { q } : {})} />
            </ReferenceInput>
            <DateTimeInput source="testedAt" label="Tested at" validate={required()} />
            <LotInput part="A" />
            <LotInput part="B" />
            <QuantityInput source="componentTemperatureA" label="Part A temperature" dimension="temperature" required />
            <QuantityInput source="componentTemperatureB" label="Part B temperature" dimension="temperature" required />
            <QuantityInput source="creamTime" label="Cream time" dimension="time" />
            <QuantityInput source="topOfCupTime" label="Top-of-cup time" dimension="time" />
            <QuantityInput source="tackFreeTime" label="Tack-free time" dimension="time" />
            <QuantityInput source="freeRiseDensity" label="Free-rise density" dimension="density" required />
          </Box>
          <TextInput source="notes" label="Notes" multiline minRows={2} fullWidth />
        </SimpleForm>
      </Create>
    </Guarded>
  );
}
