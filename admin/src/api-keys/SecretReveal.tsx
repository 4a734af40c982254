import CheckRounded from '@mui/icons-material/CheckRounded';
import ContentCopy from '@mui/icons-material/ContentCopyOutlined';
import VisibilityOffOutlined from '@mui/icons-material/VisibilityOffOutlined';
import { Alert, AlertTitle, Box, Button, Checkbox, FormControlLabel, Typography } from '@mui/material';
import { useRef, useState, type ReactNode } from 'react';
import { monoFont } from '../theme';
import type { ApiKeyWithSecret } from '../views/sdk';

async function copyText(text: string, fallback: HTMLElement | null): Promise<boolean> {
  try {
    await navigator.clipboard.writeText(text);
    return true;
  } catch {
    // no clipboard permission (plain http, some browsers): select it so Ctrl-C works
    if (fallback) {
      const range = document.createRange();
      range.selectNodeContents(fallback);
      const sel = window.getSelection();
      sel?.removeAllRanges();
      sel?.addRange(range);
    }
    return false;
  }
}

/**
 * The one moment the secret exists outside the device: shown once, copyable, and gone when the
 * dialog closes. The person confirms they stored it before they can leave.
 */
export function SecretReveal({
  apiKey,
  extra,
  usage,
  secretLabel = 'API key secret',
  onDone,
}: {
  /** Anything with a name and a once-only secret: an API key, a webhook endpoint. */
  apiKey: Pick<ApiKeyWithSecret, 'name' | 'secret'>;
  extra?: ReactNode;
  /** Where the secret goes, when it is not an API key's `X-Api-Key` header. */
  usage?: ReactNode;
  /** How screen readers name the secret box. */
  secretLabel?: string;
  onDone: () => void;
}) {
  const [copied, setCopied] = useState<'yes' | 'selected' | null>(null);
  const [stored, setStored] = useState(false);
  const box = useRef<HTMLDivElement>(null);

  return (
    <Box sx={{ display: 'grid', gap: 2 }} data-testid="secret-reveal">
      <Alert severity="warning" icon={<VisibilityOffOutlined />} sx={{ bgcolor: '#fcf1d6', border: '1px solid #ecd08e', color: '#4a3a12' }}>
        <AlertTitle sx={{ fontWeight: 600 }}>You will not see this secret again</AlertTitle>
        {usage ?? (
          <>
            Copy it now and store it where the device or system reads it; it goes in the{' '}
            <Box component="code" sx={{ fontFamily: monoFont, fontSize: '0.85em' }}>
              X-Api-Key
            </Box>{' '}
            header of each request. Pourgate keeps only a hash: if the secret is lost, rotate the key to get a new one.
          </>
        )}
      </Alert>
      <Box>
        <Typography variant="caption" color="text.secondary" component="div" sx={{ mb: 0.5 }}>
          Secret of “{apiKey.name}”
        </Typography>
        <Box sx={{ display: 'flex', alignItems: 'stretch', border: '1px solid', borderColor: 'divider', borderRadius: 1, bgcolor: '#f7f6f1' }}>
          <Box
            ref={box}
            data-testid="api-key-secret"
            tabIndex={0}
            aria-label={secretLabel}
            sx={{ flex: 1, px: 1.5, py: 1.25, fontFamily: monoFont, fontSize: '0.85rem', wordBreak: 'break-all', userSelect: 'all' }}
          >
            {apiKey.secret}
          </Box>
          <Button
            onClick={async () => setCopied((await copyText(apiKey.secret, box.current)) ? 'yes' : 'selected')}
            startIcon={copied === 'yes' ? <CheckRounded /> : <ContentCopy />}
            sx={{ borderLeft: '1px solid', borderColor: 'divider', borderRadius: '0 6px 6px 0', px: 2, flexShrink: 0 }}
            data-testid="copy-secret"
          >
            {copied === 'yes' ? 'Copied' : 'Copy'}
          </Button>
        </Box>
        {copied === 'selected' ? (
          <Typography variant="caption" color="text.secondary">
            This browser does not allow copying from here; the secret is selected, press Ctrl-C (⌘-C).
          </Typography>
        ) : null}
      </Box>
      {extra}
      <FormControlLabel
        control={<Checkbox checked={stored} onChange={(e) => setStored(e.target.checked)} data-testid="secret-stored" />}
        label="I have stored the secret somewhere safe"
      />
      <Box sx={{ display: 'flex', justifyContent: 'flex-end' }}>
        <Button variant="contained" disabled={!stored} onClick={onDone} data-testid="secret-done">
          Done
        </Button>
      </Box>
    </Box>
  );
}
