import Autorenew from '@mui/icons-material/Autorenew';
import SendOutlined from '@mui/icons-material/SendOutlined';
import { Alert, AlertTitle, Box, Button, CircularProgress, Dialog, DialogActions, DialogContent, DialogTitle, Typography } from '@mui/material';
import { useEffect, useState } from 'react';
import { CheckboxGroupInput, Form, RadioButtonGroupInput, required, SaveButton, TextInput, useDataProvider, useNotify } from 'react-admin';
import type { FieldValues } from 'react-hook-form';
import { SecretReveal } from '../api-keys/SecretReveal';
import { formErrorsOrNotify } from '../common/errors';
import type { PourgateDataProvider } from '../dataProvider';
import type { EndpointTestResult, WebhookEndpoint, WebhookEndpointWithSecret } from '../views/sdk';
import { formatDateTime } from '../format/dates';
import { formatDuration } from '../format/quantities';
import { monoFont } from '../theme';
import { eventChoices, eventInfo, OVERLAP_CHOICES, testVerdict } from './webhookRules';

function eventOptionText(choice: { id: string }) {
  return (
    <Box component="span" sx={{ display: 'block' }}>
      <Box component="span" sx={{ fontFamily: monoFont, fontSize: '0.8rem', display: 'block' }}>
        {choice.id}
      </Box>
      <Typography component="span" variant="caption" color="text.secondary" sx={{ display: 'block', lineHeight: 1.3 }}>
        {eventInfo(choice.id)}
      </Typography>
    </Box>
  );
}

const httpUrl = (v: unknown) => (typeof v === 'string' && /^https?:\/\/\S+$/i.test(v.trim()) ? undefined : 'An http:// or https:// address');

function SigningUsage() {
  return (
    <>
      Give it to the receiver now. It verifies the{' '}
      <Box component="code" sx={{ fontFamily: monoFont, fontSize: '0.85em' }}>
        webhook-signature
      </Box>{' '}
      header of every delivery with it (Standard Webhooks: HMAC-SHA256 of id, timestamp and body). Pourgate shows it
      only this once; if it is lost, rotate the secret.
    </>
  );
}

function EndpointFields() {
  return (
    <>
      <TextInput source="url" label="Receiver URL" validate={[required(), httpUrl]} fullWidth autoFocus helperText="Where Pourgate POSTs each event. Redirects are not followed; the host must be public." />
      <TextInput source="description" label="Description" fullWidth helperText="Who runs it, e.g. “ERP gateway, production”." />
      <CheckboxGroupInput
        source="eventTypes"
        label="Events to send (none ticked: every event)"
        choices={eventChoices}
        optionText={eventOptionText}
        row={false}
        sx={{ '& .MuiFormGroup-root': { display: 'grid', gridTemplateColumns: { xs: '1fr', sm: '1fr 1fr' }, columnGap: 2 } }}
      />
    </>
  );
}

/** Adds an endpoint; the answer carries the signing secret, shown here once. */
export function CreateEndpointDialog({ onClose }: { onClose: (created: boolean) => void }) {
  const dataProvider = useDataProvider();
  const notify = useNotify();
  const [created, setCreated] = useState<WebhookEndpointWithSecret | null>(null);
  const submit = async (values: FieldValues) => {
    try {
      const { data } = await dataProvider.create<WebhookEndpointWithSecret>('webhook-endpoints', { data: values });
      setCreated(data);
      return undefined;
    } catch (error) {
      return formErrorsOrNotify(error, notify);
    }
  };
  return (
    <Dialog open onClose={created ? undefined : () => onClose(false)} disableEscapeKeyDown={!!created} maxWidth="md" fullWidth aria-labelledby="create-endpoint-title">
      <DialogTitle id="create-endpoint-title">{created ? 'Endpoint added' : 'Add a webhook endpoint'}</DialogTitle>
      {created ? (
        <DialogContent>
          <SecretReveal apiKey={{ name: created.url, secret: created.secret }} usage={<SigningUsage />} secretLabel="Webhook signing secret" onDone={() => onClose(true)} />
        </DialogContent>
      ) : (
        <Form onSubmit={submit} defaultValues={{ url: '', description: '', eventTypes: [], enabled: true }}>
          <DialogContent sx={{ pb: 0 }}>
            <EndpointFields />
          </DialogContent>
          <DialogActions sx={{ px: 3, pb: 2 }}>
            <Button onClick={() => onClose(false)}>Cancel</Button>
            <SaveButton label="Add endpoint" icon={<SendOutlined />} alwaysEnable />
          </DialogActions>
        </Form>
      )}
    </Dialog>
  );
}

export function EditEndpointDialog({ endpoint, onClose }: { endpoint: WebhookEndpoint; onClose: (changed: boolean) => void }) {
  const dataProvider = useDataProvider();
  const notify = useNotify();
  const submit = async (values: FieldValues) => {
    try {
      await dataProvider.update('webhook-endpoints', { id: endpoint.id, data: { ...endpoint, ...values }, previousData: endpoint });
      notify('Endpoint saved.', { type: 'success' });
      onClose(true);
      return undefined;
    } catch (error) {
      return formErrorsOrNotify(error, notify);
    }
  };
  return (
    <Dialog open onClose={() => onClose(false)} maxWidth="md" fullWidth aria-labelledby="edit-endpoint-title">
      <DialogTitle id="edit-endpoint-title">Change endpoint</DialogTitle>
      <Form onSubmit={submit} record={endpoint}>
        <DialogContent sx={{ pb: 0 }}>
          <EndpointFields />
        </DialogContent>
        <DialogActions sx={{ px: 3, pb: 2 }}>
          <Button onClick={() => onClose(false)}>Cancel</Button>
          <SaveButton label="Save endpoint" />
        </DialogActions>
      </Form>
    </Dialog>
  );
}

/** Sends a `webhook.test` event at once and shows the receiver's answer. */
export function TestEndpointDialog({ endpoint, onClose }: { endpoint: WebhookEndpoint; onClose: () => void }) {
  const dataProvider = useDataProvider<PourgateDataProvider>();
  const [result, setResult] = useState<EndpointTestResult | null>(null);
  const [failure, setFailure] = useState<string | null>(null);
  const [run, setRun] = useState(0);
  useEffect(() => {
    let live = true;
    setResult(null);
    setFailure(null);
    dataProvider.testWebhookEndpoint(endpoint.id).then(
      ({ data }) => live && setResult(data),
      (e: Error) => live && setFailure(e.message),
    );
    return () => {
      live = false;
    };
  }, [dataProvider, endpoint.id, run]);
  const v = result ? testVerdict(result) : null;
  return (
    <Dialog open onClose={onClose} maxWidth="sm" fullWidth aria-labelledby="test-endpoint-title">
      <DialogTitle id="test-endpoint-title">Test delivery</DialogTitle>
      <DialogContent>
        <Typography variant="body2" color="text.secondary" sx={{ mb: 2, wordBreak: 'break-all' }}>
          A signed <code style={{ fontFamily: monoFont }}>webhook.test</code> event to <strong>{endpoint.url}</strong>
        </Typography>
        {!result && !failure ? (
          <Box sx={{ display: 'flex', alignItems: 'center', gap: 1.5, py: 2 }} role="status">
            <CircularProgress size={20} />
            <Typography variant="body2">Waiting for the receiver…</Typography>
          </Box>
        ) : null}
        {failure ? <Alert severity="error">{failure}</Alert> : null}
        {result && v ? (
          <Box data-testid="test-result">
            <Alert severity={v.tone} variant="outlined" sx={{ mb: 2 }}>
              <AlertTitle sx={{ fontWeight: 600 }} data-testid="test-verdict">
                {v.title}
              </AlertTitle>
              {v.detail}
            </Alert>
            <Box component="dl" sx={{ display: 'grid', gridTemplateColumns: 'auto 1fr', columnGap: 2, rowGap: 0.75, m: 0, fontSize: '0.875rem' }}>
              <Typography component="dt" variant="body2" color="text.secondary">Status</Typography>
              <Typography component="dd" variant="body2" sx={{ m: 0 }} data-testid="test-status">{result.statusCode ?? 'none'}</Typography>
              <Typography component="dt" variant="body2" color="text.secondary">Duration</Typography>
              <Typography component="dd" variant="body2" sx={{ m: 0 }}>{result.durationMs} ms</Typography>
              <Typography component="dt" variant="body2" color="text.secondary">webhook-id</Typography>
              <Typography component="dd" variant="body2" sx={{ m: 0, fontFamily: monoFont, fontSize: '0.8rem' }}>{result.eventId}</Typography>
              {result.retryAfter ? (
                <>
                  <Typography component="dt" variant="body2" color="text.secondary">Retry-After</Typography>
                  <Typography component="dd" variant="body2" sx={{ m: 0 }}>{result.retryAfter}</Typography>
                </>
              ) : null}
            </Box>
            {result.responseSnippet ? (
              <Box sx={{ mt: 2 }}>
                <Typography variant="caption" color="text.secondary">Receiver&apos;s answer (first bytes)</Typography>
                <Box component="pre" data-testid="test-snippet" sx={{ m: 0, mt: 0.5, p: 1.25, bgcolor: '#f7f6f1', border: '1px solid', borderColor: 'divider', borderRadius: 1, fontFamily: monoFont, fontSize: '0.78rem', whiteSpace: 'pre-wrap', wordBreak: 'break-all', maxHeight: 180, overflow: 'auto' }}>
                  {result.responseSnippet}
                </Box>
              </Box>
            ) : null}
          </Box>
        ) : null}
      </DialogContent>
      <DialogActions sx={{ px: 3, pb: 2 }}>
        <Button onClick={() => setRun((n) => n + 1)} disabled={!result && !failure}>
          Send again
        </Button>
        <Button variant="contained" onClick={onClose}>
          Close
        </Button>
      </DialogActions>
    </Dialog>
  );
}

/** A new signing secret now; the old one keeps signing alongside it for the overlap. */
export function RotateSecretDialog({ endpoint, onClose }: { endpoint: WebhookEndpoint; onClose: (rotated: boolean) => void }) {
  const dataProvider = useDataProvider<PourgateDataProvider>();
  const notify = useNotify();
  const [issued, setIssued] = useState<{ endpoint: WebhookEndpointWithSecret; overlap: number; at: number } | null>(null);
  const submit = async (values: FieldValues) => {
    const overlap = Number(values.overlapSeconds);
    try {
      const { data } = await dataProvider.rotateWebhookSecret(endpoint.id, overlap);
      setIssued({ endpoint: data, overlap, at: Date.now() });
    } catch (error) {
      notify((error as Error).message, { type: 'error' });
    }
    return undefined;
  };
  return (
    <Dialog open onClose={issued ? undefined : () => onClose(false)} disableEscapeKeyDown={!!issued} maxWidth="sm" fullWidth aria-labelledby="rotate-secret-title">
      <DialogTitle id="rotate-secret-title">{issued ? 'New signing secret' : 'Rotate the signing secret'}</DialogTitle>
      {issued ? (
        <DialogContent>
          <SecretReveal
            apiKey={{ name: issued.endpoint.url, secret: issued.endpoint.secret }}
            usage={<SigningUsage />}
            secretLabel="Webhook signing secret"
            onDone={() => onClose(true)}
            extra={
              <Alert severity="info" variant="outlined">
                {issued.overlap > 0
                  ? `Until about ${formatDateTime(issued.at + issued.overlap * 1000)} (${formatDuration(issued.overlap)}), every delivery carries two signatures, one per secret, so the receiver can switch at its own pace.`
                  : 'The previous secret stopped signing just now.'}
              </Alert>
            }
          />
        </DialogContent>
      ) : (
        <Form onSubmit={submit} defaultValues={{ overlapSeconds: 86_400 }}>
          <DialogContent sx={{ pb: 0 }}>
            <Typography variant="body2" sx={{ mb: 1, wordBreak: 'break-all' }}>
              A new secret for <strong>{endpoint.url}</strong>. Deliveries are signed with both secrets during the overlap.
            </Typography>
            <RadioButtonGroupInput source="overlapSeconds" label="Overlap with the old secret" choices={[...OVERLAP_CHOICES]} row={false} parse={(v: string) => Number(v)} />
          </DialogContent>
          <DialogActions sx={{ px: 3, pb: 2 }}>
            <Button onClick={() => onClose(false)}>Cancel</Button>
            <SaveButton label="Rotate secret" icon={<Autorenew />} alwaysEnable />
          </DialogActions>
        </Form>
      )}
    </Dialog>
  );
}
