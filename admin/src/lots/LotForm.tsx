import { Box } from '@mui/material';
import { AutocompleteInput, Create, DateInput, Edit, NumberInput, ReferenceInput, required, SaveButton, SelectInput, SimpleForm, TextInput, Toolbar } from 'react-admin';
import { useWatch } from 'react-hook-form';
import { Guarded } from '../common/Guarded';
import { PageHeader } from '../common/PageHeader';
import { localToday } from '../devices/deviceRules';
import { SdsCaution } from '../shop/SdsCaution';
import { useSaved } from '../shop/useSaved';
import { PART_CHOICES, type Lot } from './lotRules';

const notBefore = (field: string, what: string) => (value: unknown, all: Record<string, unknown>) =>
  value && all[field] && String(value) < String(all[field]) ? `Must not be before the ${what}` : undefined;

function SystemInput() {
  const part = useWatch({ name: 'part' });
  return (
    <ReferenceInput source="materialSystemId" reference="material-systems" perPage={50} sort={{ field: 'name', order: 'ASC' }}>
      <AutocompleteInput
        label={part === 'pigment' ? 'Material system (optional for pigment)' : 'Material system'}
        optionText="name"
        filterToQuery={(q: string) => (q ? { q } : {})}
        validate={part === 'pigment' ? undefined : required()}
        helperText={part === 'pigment' ? 'A pigment may serve several systems' : false}
      />
    </ReferenceInput>
  );
}

function Fields() {
  return (
    <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', md: '1fr 1fr' }, columnGap: 2, width: '100%' }}>
      <SelectInput source="part" label="Part" choices={PART_CHOICES} validate={required()} />
      <SystemInput />
      <TextInput source="lotNumber" label="Lot number" validate={required()} helperText="As printed on the drum or pail" />
      <span />
      <DateInput source="receivedOn" label="Received" validate={required()} />
      <DateInput source="expiresOn" label="Use by" validate={[required(), notBefore('receivedOn', 'received date')]} helperText="The last day the lot may be used" />
      <DateInput source="openedOn" label="Opened" validate={notBefore('receivedOn', 'received date')} helperText="Empty while sealed" />
      <NumberInput
        source="shelfLifeDaysAfterOpening"
        label="Shelf life after opening (days)"
        min={1}
        max={3650}
        step={1}
        helperText="From the supplier’s data sheet; empty: usable until the use-by day"
      />
      <TextInput source="notes" label="Notes" multiline minRows={2} sx={{ gridColumn: '1 / -1' }} />
    </Box>
  );
}

export function LotCreate() {
  const saved = useSaved<Lot>('lots', (l) => `Lot ${l.lotNumber} recorded.`);
  return (
    <Guarded resource="lots" action="create">
      <PageHeader title="Record a lot" lead="One lot per drum or pail number of part A, part B or pigment." />
      <SdsCaution />
      <Create resource="lots" mutationOptions={saved} title="Record a lot">
        <SimpleForm
          defaultValues={{ part: 'A', receivedOn: localToday(), materialSystemId: null }}
          toolbar={
            <Toolbar>
              <SaveButton label="Save lot" />
            </Toolbar>
          }
          sx={{ maxWidth: 820 }}
        >
          <Fields />
        </SimpleForm>
      </Create>
    </Guarded>
  );
}

export function LotEdit() {
  const saved = useSaved<Lot>('lots', (l) => `Lot ${l.lotNumber} saved.`);
  return (
    <Guarded resource="lots" action="edit">
      <PageHeader title="Change a lot" lead="For example the day it was opened. Part and system stay fixed once batches or cup tests use the lot." />
      <Edit resource="lots" mutationMode="pessimistic" mutationOptions={saved} title="Lot" actions={false}>
        <SimpleForm
          toolbar={
            <Toolbar>
              <SaveButton label="Save lot" />
            </Toolbar>
          }
          sx={{ maxWidth: 820 }}
        >
          <Fields />
        </SimpleForm>
      </Edit>
    </Guarded>
  );
}
