import { Alert, Box, Button, Checkbox, Dialog, DialogActions, DialogContent, DialogTitle, FormControlLabel, TextField, Typography } from '@mui/material';
import { useId, useState, type FormEvent, type KeyboardEvent } from 'react';
import { useDataProvider } from 'react-admin';
import type { UnitSystem } from '../auth/me';
import { problemOf } from '../dataProvider/problem';
import { reviewReading } from './commands';
import { describeReason } from './reasons';
import { readingTitle, readingValue, type Reading } from './labels';

export type Decision = 'waive' | 'uphold';

/**
 * Waive (a note is required: it stays with the reading and in the audit log) or uphold a rejected
 * reading; upholding can scrap the batch. Ctrl+Enter sends, Esc closes.
 */
export function ReviewDialog({
  reading,
  decision,
  batchLabel,
  unitSystem,
  onClose,
}: {
  reading: Reading;
  decision: Decision;
  batchLabel: string;
  unitSystem: UnitSystem;
  onClose: (result: { reading: Reading; scrapped: boolean } | null) => void;
}) {
  const dataProvider = useDataProvider();
  const [note, setNote] = useState('');
  const [scrap, setScrap] = useState(false);
  const [busy, setBusy] = useState(false);
  const [noteError, setNoteError] = useState<string | null>(null);
  const [failure, setFailure] = useState<string | null>(null);
  const titleId = useId();
  const waive = decision === 'waive';

  const submit = async (e?: FormEvent) => {
    e?.preventDefault();
    if (busy) return;
    if (waive && !note.trim()) {
      setNoteError('Say why this deviation is acceptable; the note is kept with the reading.');
      return;
    }
    setBusy(true);
    setFailure(null);
    try {
      const body = waive ? { decision, note: note.trim() } : { decision, ...(note.trim() ? { note: note.trim() } : {}), scrap };
      const result = await reviewReading<Reading>(dataProvider, reading.id, body);
      onClose({ reading: result, scrapped: !waive && scrap });
    } catch (error) {
      const problem = problemOf(error);
      if (problem?.errors?.note) setNoteError(problem.errors.note);
      else setFailure((error as Error)?.message || 'The decision was not saved.');
      setBusy(false);
    }
  };

  const onKeyDown = (e: KeyboardEvent) => {
    if (e.key === 'Enter' && (e.ctrlKey || e.metaKey)) {
      e.preventDefault();
      void submit();
    }
  };

  const first = reading.reasons[0];
  return (
    <Dialog open onClose={() => !busy && onClose(null)} aria-labelledby={titleId} maxWidth="sm" fullWidth onKeyDown={onKeyDown}>
      <form onSubmit={submit} noValidate>
        <DialogTitle id={titleId}>{waive ? 'Waive this rejection' : 'Uphold this rejection'}</DialogTitle>
        <DialogContent sx={{ display: 'grid', gap: 2 }}>
          <Box sx={{ bgcolor: '#faf9f5', border: '1px solid', borderColor: 'divider', borderRadius: 1, p: 1.5 }}>
            <Typography variant="body2" sx={{ fontWeight: 600 }}>
              {first ? describeReason(first, unitSystem).line : 'Rejected reading'}
              {reading.reasons.length > 1 ? ` (+${reading.reasons.length - 1} more)` : ''}
            </Typography>
            <Typography variant="caption" color="text.secondary" component="p" sx={{ mt: 0.25 }}>
              {readingTitle(reading)}, {readingValue(reading)} · {batchLabel}
            </Typography>
          </Box>
          {waive ? (
            <Typography variant="body2" color="text.secondary">
              The reading counts as accepted for this batch. When every rejection of the batch is waived, the batch can be released.
            </Typography>
          ) : (
            <Typography variant="body2" color="text.secondary">
              The batch stays on hold and cannot be released while this rejection stands.
            </Typography>
          )}
          <TextField
            label={waive ? 'Why is it acceptable? (required)' : 'Note (optional)'}
            name="note"
            value={note}
            onChange={(e) => {
              setNote(e.target.value);
              if (noteError) setNoteError(null);
            }}
            multiline
            minRows={3}
            autoFocus
            required={waive}
            error={!!noteError}
            helperText={noteError ?? (waive ? 'E.g. “Cup test within spec; parts checked by QA.” Kept with the reading and in the audit log.' : 'What was found, and what happens to the parts.')}
            slotProps={{ htmlInput: { maxLength: 2000, 'data-testid': 'review-note' } }}
          />
          {!waive ? (
            <FormControlLabel
              control={<Checkbox checked={scrap} onChange={(e) => setScrap(e.target.checked)} data-testid="review-scrap" />}
              label={
                <span>
                  <strong>Scrap the batch</strong> — it can never be released afterwards
                </span>
              }
            />
          ) : null}
          {failure ? <Alert severity="error">{failure}</Alert> : null}
        </DialogContent>
        <DialogActions sx={{ px: 3, pb: 2 }}>
          <Typography variant="caption" color="text.secondary" sx={{ mr: 'auto' }}>
            Ctrl+Enter to confirm · Esc to cancel
          </Typography>
          <Button onClick={() => onClose(null)} disabled={busy}>
            Cancel
          </Button>
          <Button type="submit" variant="contained" color={waive ? 'primary' : scrap ? 'error' : 'warning'} disabled={busy} data-testid="review-confirm">
            {waive ? 'Waive' : scrap ? 'Uphold and scrap' : 'Uphold'}
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
