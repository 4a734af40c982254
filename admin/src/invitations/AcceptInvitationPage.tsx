import CheckCircle from '@mui/icons-material/CheckCircleOutline';
import { Alert, Box, Button, CircularProgress, Skeleton, TextField, Typography } from '@mui/material';
import { useEffect, useState, type ChangeEvent, type FormEvent } from 'react';
import { useDataProvider, useLogin } from 'react-admin';
import type { InvitationPreview } from '../views/sdk';
import { roleLabel } from '../auth/roles';
import type { TokenResponse } from '../dataProvider/session';
import { Link as RouterLink, useSearchParams } from 'react-router-dom';
import { AuthShell } from '../auth/AuthShell';
import type { PourgateDataProvider } from '../dataProvider';
import { problemOf } from '../dataProvider/problem';

export const MIN_PASSWORD_LENGTH = 10;

/** Checks the form before it is sent; the API checks again and its field errors win. */
export function checkAcceptForm(v: { name: string; password: string; confirm: string }): Record<string, string> {
  const errors: Record<string, string> = {};
  if (!v.name.trim()) errors.name = 'Enter the name your colleagues know you by.';
  if (v.password.length < MIN_PASSWORD_LENGTH) errors.password = `Use at least ${MIN_PASSWORD_LENGTH} characters.`;
  if (v.confirm !== v.password) errors.confirm = 'The two passwords differ.';
  return errors;
}

/** Where an invitation link lands: `#/accept-invitation?token=…`. Public: no session needed. */
export function AcceptInvitationPage() {
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  const dataProvider = useDataProvider<PourgateDataProvider>();
  const [values, setValues] = useState({ name: '', password: '', confirm: '' });
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [failure, setFailure] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const [doneFor, setDoneFor] = useState<string | null>(null);
  const [spent, setSpent] = useState<string | null>(null);
  const [preview, setPreview] = useState<InvitationPreview | null>(null);
  const [looking, setLooking] = useState(!!token);
  const login = useLogin();

  // what the link offers: which shop, which role, the name the admin typed (prefilled)
  useEffect(() => {
    if (!token) return;
    let live = true;
    dataProvider
      .lookupInvitation(token)
      .then((p) => {
        if (!live) return;
        setPreview(p);
        setValues((v) => (v.name ? v : { ...v, name: p.name ?? '' }));
      })
      .catch((err: unknown) => {
        if (!live) return;
        if ((err as { status?: number }).status === 410) setSpent((err as Error).message || 'This invitation was already used, withdrawn or has expired. Ask your IT admin for a new one.');
      })
      .finally(() => {
        if (live) setLooking(false);
      });
    return () => {
      live = false;
    };
  }, [dataProvider, token]);

  if (spent) {
    return (
      <AuthShell heading="This invitation no longer works">
        <Alert severity="warning" role="alert" data-testid="invitation-spent">
          {spent}
        </Alert>
        <Button component={RouterLink} to="/login" sx={{ mt: 2 }}>
          Go to sign-in
        </Button>
      </AuthShell>
    );
  }

  if (!token) {
    return (
      <AuthShell heading="Accept an invitation">
        <Alert severity="warning" data-testid="invitation-missing-token">
          This link has no invitation token. Open the link from your invitation e-mail again, or ask your IT admin
          to send a new invitation.
        </Alert>
        <Button component={RouterLink} to="/login" sx={{ mt: 2 }}>
          Go to sign-in
        </Button>
      </AuthShell>
    );
  }

  if (doneFor) {
    return (
      <AuthShell heading="Your account is ready">
        <Box sx={{ display: 'flex', gap: 1.5, alignItems: 'flex-start', mb: 3 }}>
          <CheckCircle color="success" />
          <Typography variant="body2">
            Sign in as <strong>{doneFor}</strong> with the password you just chose.
          </Typography>
        </Box>
        <Button variant="contained" component={RouterLink} to={`/login?email=${encodeURIComponent(doneFor)}`}>
          Sign in
        </Button>
      </AuthShell>
    );
  }

  const set = (k: keyof typeof values) => (e: ChangeEvent<HTMLInputElement>) => setValues((v) => ({ ...v, [k]: e.target.value }));

  async function submit(e: FormEvent) {
    e.preventDefault();
    const local = checkAcceptForm(values);
    setErrors(local);
    setFailure(null);
    if (Object.keys(local).length) return;
    setBusy(true);
    try {
      const res = await dataProvider.acceptInvitation({ token, name: values.name.trim(), password: values.password });
      if (res.session) {
        // signed in at once: straight to the overview, no second sign-in
        await login({ session: res.session as unknown as TokenResponse }, '/');
        return;
      }
      setDoneFor(res.email);
    } catch (err) {
      const problem = problemOf(err);
      // 410: used, withdrawn or expired; the form cannot help, say so and stop
      if ((err as { status?: number }).status === 410) {
        setSpent((err as Error).message || 'This invitation was already used, withdrawn or has expired. Ask your IT admin for a new one.');
        return;
      }
      setErrors(problem?.errors ?? {});
      setFailure((err as Error)?.message || 'The invitation could not be accepted.');
    } finally {
      setBusy(false);
    }
  }

  return (
    <AuthShell heading="Accept your invitation" lead="Choose the name shown to your colleagues and a password for the console.">
      {looking ? (
        <Skeleton variant="rounded" height={56} sx={{ mb: 2 }} />
      ) : preview ? (
        <Alert severity="info" icon={false} sx={{ mb: 2 }} data-testid="invitation-preview">
          {preview.invitedBy ? `${preview.invitedBy} invites you` : 'You are invited'} to <strong>{preview.organization.name}</strong> as{' '}
          <strong>{roleLabel(preview.role)}</strong>, with the address <strong>{preview.email}</strong>.
        </Alert>
      ) : null}
      <Box component="form" onSubmit={submit} noValidate aria-label="Accept invitation" sx={{ display: 'grid', gap: 2 }}>
        {failure ? (
          <Alert severity="error" role="alert">
            {failure}
          </Alert>
        ) : null}
        <TextField label="Your name" name="name" autoComplete="name" required value={values.name} onChange={set('name')} error={!!errors.name} helperText={errors.name} size="medium" />
        <TextField
          label="Password"
          name="password"
          type="password"
          autoComplete="new-password"
          required
          value={values.password}
          onChange={set('password')}
          error={!!errors.password}
          helperText={errors.password ?? `At least ${MIN_PASSWORD_LENGTH} characters. A passphrase is easiest to remember.`}
          size="medium"
        />
        <TextField
          label="Repeat the password"
          name="confirm"
          type="password"
          autoComplete="new-password"
          required
          value={values.confirm}
          onChange={set('confirm')}
          error={!!errors.confirm}
          helperText={errors.confirm}
          size="medium"
        />
        <Button type="submit" variant="contained" size="large" disabled={busy} startIcon={busy ? <CircularProgress size={16} color="inherit" /> : undefined}>
          {busy ? 'Setting up…' : 'Create my account'}
        </Button>
      </Box>
    </AuthShell>
  );
}
