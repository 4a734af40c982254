import Autorenew from '@mui/icons-material/Autorenew';
import { Alert, Box, Button, Dialog, DialogActions, DialogContent, DialogTitle, Typography } from '@mui/material';
import { useState } from 'react';
import { Form, RadioButtonGroupInput, SaveButton, useDataProvider, useNotify } from 'react-admin';
import type { FieldValues } from 'react-hook-form';
import type { PourgateDataProvider } from '../dataProvider';
import { formatDateTime } from '../format/dates';
import { formatDuration } from '../format/quantities';
import { monoFont } from '../theme';
import type { ApiKey, ApiKeyWithSecret } from '../views/sdk';
import { DEFAULT_GRACE_SECONDS, GRACE_CHOICES } from './keyRules';
import { SecretReveal } from './SecretReveal';

/**
 * Rotation issues a new secret at once; the old one keeps working through the grace period so
 * a device can be switched over without dropping readings.
 */
export function RotateKeyDialog({ apiKey, onClose }: { apiKey: ApiKey; onClose: (rotated: boolean) => void }) {
  const dataProvider = useDataProvider<PourgateDataProvider>();
  const notify = useNotify();
  const [issued, setIssued] = useState<{ key: ApiKeyWithSecret; graceSeconds: number; at: number } | null>(null);

  const submit = async (values: FieldValues) => {
    const graceSeconds = Number(values.graceSeconds);
    try {
      const { data } = await dataProvider.rotateApiKey(apiKey.id, graceSeconds);
      setIssued({ key: data, graceSeconds, at: Date.now() });
    } catch (error) {
      notify((error as Error).message, { type: 'error' });
    }
    return undefined;
  };

  return (
    <Dialog open onClose={issued ? undefined : () => onClose(false)} disableEscapeKeyDown={!!issued} maxWidth="sm" fullWidth aria-labelledby="rotate-key-title">
      <DialogTitle id="rotate-key-title">{issued ? 'New secret issued' : `Rotate “${apiKey.name}”`}</DialogTitle>
      {issued ? (
        <DialogContent>
          <SecretReveal
            apiKey={issued.key}
            onDone={() => onClose(true)}
            extra={
              <Alert severity="info" variant="outlined">
                {issued.graceSeconds > 0
                  ? `The previous secret keeps working for ${formatDuration(issued.graceSeconds)}, until about ${formatDateTime(issued.at + issued.graceSeconds * 1000)}. Switch the device over before then.`
                  : 'The previous secret stopped working just now.'}
              </Alert>
            }
          />
        </DialogContent>
      ) : (
        <Form onSubmit={submit} defaultValues={{ graceSeconds: DEFAULT_GRACE_SECONDS }}>
          <DialogContent sx={{ pb: 0 }}>
            <Typography variant="body2" sx={{ mb: 1 }}>
              A new secret replaces the one starting{' '}
              <Box component="span" sx={{ fontFamily: monoFont, fontSize: '0.82rem' }}>
                {apiKey.prefix}…
              </Box>
              . Name, scopes and expiry stay the same.
            </Typography>
            <RadioButtonGroupInput
              source="graceSeconds"
              label="Grace period for the old secret"
              choices={[...GRACE_CHOICES]}
              row={false}
              parse={(v: string) => Number(v)}
            />
          </DialogContent>
          <DialogActions sx={{ px: 3, pb: 2 }}>
            <Button onClick={() => onClose(false)}>Cancel</Button>
            <SaveButton label="Rotate key" icon={<Autorenew />} alwaysEnable />
          </DialogActions>
        </Form>
      )}
    </Dialog>
  );
}
