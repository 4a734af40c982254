import KeyOutlined from '@mui/icons-material/KeyOutlined';
import { Box, Button, Dialog, DialogActions, DialogContent, DialogTitle, Typography } from '@mui/material';
import type { ApiKeyScope } from '@pourgate/permissions';
import { API_KEY_SCOPES } from '@pourgate/permissions';
import { useEffect, useRef, useState } from 'react';
import {
  AutocompleteInput,
  CheckboxGroupInput,
  Form,
  RadioButtonGroupInput,
  ReferenceInput,
  required,
  SaveButton,
  SelectInput,
  TextInput,
  useDataProvider,
  useNotify,
} from 'react-admin';
import { useFormContext, useWatch, type FieldValues } from 'react-hook-form';
import { formErrorsOrNotify } from '../common/errors';
import type { ApiKeyKind, ApiKeyWithSecret } from '../views/sdk';
import { buildKeyPayload, DEFAULT_SCOPES, EXPIRY_CHOICES, keyFormErrors, KIND_LABEL, SCOPE_INFO, type KeyFormValues } from './keyRules';
import { SecretReveal } from './SecretReveal';
import { monoFont } from '../theme';

const scopeChoices = API_KEY_SCOPES.map((s) => ({ id: s, name: s }));

function scopeOptionText(choice: { id: ApiKeyScope }) {
  return (
    <Box component="span" sx={{ display: 'block' }}>
      <Box component="span" sx={{ fontFamily: monoFont, fontSize: '0.8rem', display: 'block' }}>
        {choice.id}
      </Box>
      <Typography component="span" variant="caption" color="text.secondary" sx={{ display: 'block', lineHeight: 1.3 }}>
        {SCOPE_INFO[choice.id]}
      </Typography>
    </Box>
  );
}

const atLeastOneScope = (value: unknown) => (Array.isArray(value) && value.length > 0 ? undefined : 'Pick at least one scope.');

/** When the kind changes, offer that kind's usual scopes (the first render keeps the defaults). */
function ScopesFollowKind() {
  const kind = useWatch({ name: 'kind' }) as ApiKeyKind;
  const { setValue } = useFormContext();
  const first = useRef(true);
  useEffect(() => {
    if (first.current) {
      first.current = false;
      return;
    }
    setValue('scopes', DEFAULT_SCOPES[kind] ?? [], { shouldDirty: true });
  }, [kind, setValue]);
  return null;
}

interface DeviceChoice {
  id: string;
  name: string;
  serial: string;
}

const deviceText = (d: DeviceChoice) => (d ? `${d.name} · ${d.serial}` : '');

function DeviceIdInput() {
  const kind = useWatch({ name: 'kind' }) as ApiKeyKind;
  if (kind !== 'device') return null;
  return (
    <ReferenceInput source="deviceId" reference="devices" filter={{ retired: false }} sort={{ field: 'name', order: 'ASC' }} perPage={50}>
      <AutocompleteInput
        label="Bind to a device (optional)"
        optionText={deviceText}
        filterToQuery={(q: string) => (q ? { q } : {})}
        helperText="A bound key can post readings only as that scale or logger."
        fullWidth
      />
    </ReferenceInput>
  );
}

/** `onClose(true)` once a key was issued (the list refreshes then, not while the secret shows). */
export function CreateKeyDialog({ kinds, onClose }: { kinds: ApiKeyKind[]; onClose: (issued: boolean) => void }) {
  const dataProvider = useDataProvider();
  const notify = useNotify();
  const [issued, setIssued] = useState<ApiKeyWithSecret | null>(null);
  const onlyKind = kinds.length === 1 ? kinds[0] : undefined;
  const defaultKind: ApiKeyKind = onlyKind ?? 'device';

  const submit = async (values: FieldValues) => {
    try {
      const payload = buildKeyPayload(values as KeyFormValues);
      const { data } = await dataProvider.create<ApiKeyWithSecret>('api-keys', { data: payload });
      setIssued(data);
      return undefined;
    } catch (error) {
      const fields = formErrorsOrNotify(error, notify);
      return fields ? keyFormErrors(fields) : undefined;
    }
  };

  return (
    <Dialog
      open
      // once the secret is on screen, only "Done" closes the dialog
      onClose={issued ? undefined : () => onClose(false)}
      disableEscapeKeyDown={!!issued}
      maxWidth="sm"
      fullWidth
      aria-labelledby="create-key-title"
    >
      <DialogTitle id="create-key-title">{issued ? 'Key issued' : onlyKind === 'device' ? 'Issue a device key' : 'Issue an API key'}</DialogTitle>
      {issued ? (
        <DialogContent>
          <SecretReveal apiKey={issued} onDone={() => onClose(true)} />
        </DialogContent>
      ) : (
        <Form
          onSubmit={submit}
          defaultValues={{ name: '', kind: defaultKind, environment: 'test', scopes: DEFAULT_SCOPES[defaultKind], deviceId: null, expiresAfter: '90' }}
        >
          <DialogContent sx={{ pb: 0 }}>
            <ScopesFollowKind />
            <TextInput source="name" label="Name" validate={required()} fullWidth autoFocus helperText="What uses it, e.g. “Bench scale 2, pour line B”." />
            {onlyKind ? (
              <Typography variant="body2" sx={{ mb: 2 }} data-testid="kind-fixed">
                Kind: <strong>{KIND_LABEL[onlyKind]} key</strong>
                <Typography component="span" variant="body2" color="text.secondary">
                  {' '}— integration keys for the ERP are issued by an IT admin.
                </Typography>
              </Typography>
            ) : (
              <RadioButtonGroupInput
                source="kind"
                label="Kind"
                row
                choices={[
                  { id: 'device', name: 'Device: a bench scale or logger' },
                  { id: 'integration', name: 'Integration: the ERP or another system' },
                ]}
                validate={required()}
              />
            )}
            <RadioButtonGroupInput
              source="environment"
              label="Environment"
              row
              choices={[
                { id: 'test', name: 'Test: simulators and trials' },
                { id: 'live', name: 'Live: the shop floor' },
              ]}
              validate={required()}
            />
            <DeviceIdInput />
            <CheckboxGroupInput
              source="scopes"
              label="Scopes"
              choices={scopeChoices}
              optionText={scopeOptionText}
              row={false}
              validate={atLeastOneScope}
              sx={{ '& .MuiFormGroup-root': { display: 'grid', gridTemplateColumns: { xs: '1fr', sm: '1fr 1fr' }, columnGap: 1 } }}
            />
            <SelectInput source="expiresAfter" label="Expires after" choices={[...EXPIRY_CHOICES]} validate={required()} sx={{ minWidth: 240 }} />
          </DialogContent>
          <DialogActions sx={{ px: 3, pb: 2 }}>
            <Button onClick={() => onClose(false)}>Cancel</Button>
            <SaveButton label="Issue key" icon={<KeyOutlined />} alwaysEnable />
          </DialogActions>
        </Form>
      )}
    </Dialog>
  );
}
