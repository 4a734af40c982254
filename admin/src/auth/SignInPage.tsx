import Visibility from '@mui/icons-material/VisibilityOutlined';
import VisibilityOff from '@mui/icons-material/VisibilityOffOutlined';
import { Alert, Box, Button, CircularProgress, IconButton, InputAdornment, Link, TextField } from '@mui/material';
import { useEffect, useState, type FormEvent } from 'react';
import { useCheckAuth, useLogin } from 'react-admin';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { problemOf } from '../dataProvider/problem';
import { AuthShell } from './AuthShell';

function describeFailure(error: unknown): { message: string; retryAfter?: number } {
  const status = (error as { status?: number } | null)?.status;
  const problem = problemOf(error);
  if (status === 401) return { message: 'That e-mail and password do not match an active account.' };
  if (status === 429) {
    return { message: 'Too many sign-in attempts from here.', retryAfter: problem?.retryAfter ?? 60 };
  }
  if (status === undefined || status === 0) return { message: 'The Pourgate service cannot be reached. Check the connection and try again.' };
  return { message: (error as Error)?.message || 'Signing in failed.' };
}

export function SignInPage() {
  const [params] = useSearchParams();
  const [email, setEmail] = useState(params.get('email') ?? '');
  const [password, setPassword] = useState('');
  const [showPassword, setShowPassword] = useState(false);
  const [busy, setBusy] = useState(false);
  const [failure, setFailure] = useState<{ message: string; until?: number } | null>(null);
  const [now, setNow] = useState(Date.now());
  const login = useLogin();
  const checkAuth = useCheckAuth();
  const navigate = useNavigate();

  // already signed in (another tab of this session, or the back button): go to the console
  useEffect(() => {
    checkAuth({}, false, undefined)
      .then(() => navigate('/'))
      .catch(() => undefined);
  }, [checkAuth, navigate]);

  const waiting = failure?.until !== undefined && failure.until > now;
  useEffect(() => {
    if (!waiting) return;
    const t = setInterval(() => setNow(Date.now()), 1000);
    return () => clearInterval(t);
  }, [waiting]);

  async function submit(e: FormEvent) {
    e.preventDefault();
    if (busy || waiting) return;
    setBusy(true);
    setFailure(null);
    try {
      await login({ email, password });
    } catch (err) {
      const f = describeFailure(err);
      setFailure({ message: f.message, until: f.retryAfter !== undefined ? Date.now() + f.retryAfter * 1000 : undefined });
      setNow(Date.now());
      setBusy(false);
    }
  }

  const secondsLeft = waiting ? Math.ceil((failure!.until! - now) / 1000) : 0;

  return (
    <AuthShell heading="Sign in" lead="Use the e-mail address your administrator invited.">
      <Box component="form" onSubmit={submit} noValidate aria-label="Sign in" sx={{ display: 'grid', gap: 2 }}>
        {failure ? (
          <Alert severity="error" role="alert" data-testid="sign-in-error">
            {failure.message}
            {waiting ? ` Try again in ${secondsLeft} s.` : ''}
          </Alert>
        ) : null}
        <TextField
          label="E-mail"
          type="email"
          name="email"
          autoComplete="username"
          autoFocus={!email}
          required
          fullWidth
          size="medium"
          value={email}
          onChange={(e) => setEmail(e.target.value)}
        />
        <TextField
          label="Password"
          type={showPassword ? 'text' : 'password'}
          name="password"
          autoComplete="current-password"
          autoFocus={!!email}
          required
          fullWidth
          size="medium"
          value={password}
          onChange={(e) => setPassword(e.target.value)}
          slotProps={{
            input: {
              endAdornment: (
                <InputAdornment position="end">
                  <IconButton
                    aria-label={showPassword ? 'Hide password' : 'Show password'}
                    onClick={() => setShowPassword((v) => !v)}
                    edge="end"
                    size="small"
                  >
                    {showPassword ? <VisibilityOff fontSize="small" /> : <Visibility fontSize="small" />}
                  </IconButton>
                </InputAdornment>
              ),
            },
          }}
        />
        <Button
          type="submit"
          variant="contained"
          size="large"
          disabled={busy || waiting || !email || !password}
          startIcon={busy ? <CircularProgress size={16} color="inherit" /> : undefined}
        >
          {busy ? 'Signing in…' : 'Sign in'}
        </Button>
        <Box sx={{ fontSize: '0.85rem', color: 'text.secondary' }}>
          No account yet? Ask your IT admin for an invitation. Wiring a device?{' '}
          <Link href="/docs" target="_blank" rel="noopener">
            Read the API reference
          </Link>
          .
        </Box>
      </Box>
    </AuthShell>
  );
}
