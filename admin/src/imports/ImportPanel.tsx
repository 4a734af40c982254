import CheckCircleOutline from '@mui/icons-material/CheckCircleOutline';
import ErrorOutline from '@mui/icons-material/ErrorOutline';
import UploadFileOutlined from '@mui/icons-material/UploadFileOutlined';
import { Alert, Box, Button, Card, CardContent, LinearProgress, Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import { useEffect, useId, useRef, useState, type DragEvent } from 'react';
import { StatusChip } from '../common/StatusChip';
import { monoFont } from '../theme';
import { formatNumber } from '../format/quantities';
import { isFinished, pollImport, progressOf, type ImportJob } from './upload';

export interface ImportPanelProps {
  upload: (file: File) => Promise<{ job: ImportJob; replayed: boolean }>;
  fetchJob: (id: string) => Promise<ImportJob>;
  intervalMs?: number;
  /** Called once an import is finished (to refresh lists of imports). */
  onFinished?: () => void;
}

export const IMPORT_STATUS: Record<string, { label: string; tone: 'good' | 'caution' | 'bad' | 'quiet' | 'info' }> = {
  queued: { label: 'Waiting', tone: 'quiet' },
  running: { label: 'Reading rows', tone: 'info' },
  done: { label: 'Finished', tone: 'good' },
  failed: { label: 'Failed', tone: 'bad' },
};

const MAX_BYTES = 5 * 1024 * 1024;

/** Choose or drop a CSV, send it, and follow the import until it is finished. */
export function ImportPanel({ upload, fetchJob, intervalMs = 600, onFinished }: ImportPanelProps) {
  const inputId = useId();
  const inputRef = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [job, setJob] = useState<ImportJob | null>(null);
  const [replayed, setReplayed] = useState(false);
  const [sending, setSending] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [dragging, setDragging] = useState(false);
  const abort = useRef<AbortController | null>(null);

  useEffect(() => () => abort.current?.abort(), []);

  const start = async (chosen: File) => {
    abort.current?.abort();
    setFile(chosen);
    setJob(null);
    setError(null);
    setReplayed(false);
    if (!/\.(csv|txt)$/i.test(chosen.name) && chosen.type !== 'text/csv') {
      setError('Choose the CSV file the logger exported (.csv).');
      return;
    }
    if (chosen.size > MAX_BYTES) {
      setError(`The file is ${formatNumber(chosen.size / 1e6, { decimals: 1 })} MB; split it into files under 5 MB.`);
      return;
    }
    setSending(true);
    try {
      const answer = await upload(chosen);
      setJob(answer.job);
      setReplayed(answer.replayed);
      setSending(false);
      if (!isFinished(answer.job)) {
        const ctl = new AbortController();
        abort.current = ctl;
        await pollImport(() => fetchJob(answer.job.id), setJob, { intervalMs, signal: ctl.signal });
      }
      onFinished?.();
    } catch (e) {
      setError((e as Error)?.message || 'The file could not be sent.');
    } finally {
      setSending(false);
    }
  };

  const onDrop = (e: DragEvent) => {
    e.preventDefault();
    setDragging(false);
    const f = e.dataTransfer.files?.[0];
    if (f) void start(f);
  };

  const percent = job ? progressOf(job) : 0;
  const status = job ? (IMPORT_STATUS[job.status] ?? { label: job.status, tone: 'quiet' as const }) : null;

  return (
    <Box sx={{ display: 'grid', gap: 2 }}>
      <Box
        onDragOver={(e) => {
          e.preventDefault();
          setDragging(true);
        }}
        onDragLeave={() => setDragging(false)}
        onDrop={onDrop}
        sx={{
          border: '2px dashed',
          borderColor: dragging ? 'primary.main' : 'divider',
          bgcolor: dragging ? '#eef5f5' : 'background.paper',
          borderRadius: 1.5,
          p: 4,
          textAlign: 'center',
          display: 'grid',
          justifyItems: 'center',
          gap: 1,
          transition: 'background-color 120ms, border-color 120ms',
        }}
      >
        <UploadFileOutlined sx={{ fontSize: 36, color: 'primary.main' }} aria-hidden />
        <Typography variant="body1" sx={{ fontWeight: 500 }}>
          Drop a logger CSV here, or
        </Typography>
        <input
          ref={inputRef}
          id={inputId}
          type="file"
          accept=".csv,text/csv"
          hidden
          data-testid="import-file"
          onChange={(e) => {
            const f = e.target.files?.[0];
            if (f) void start(f);
            e.target.value = '';
          }}
        />
        <Button variant="contained" disabled={sending} onClick={() => inputRef.current?.click()} aria-controls={inputId}>
          Choose a file
        </Button>
        <Typography variant="caption" color="text.secondary">
          CSV up to 5 MB. Sending the same file twice imports it once.
        </Typography>
      </Box>

      {error ? (
        <Alert severity="error" data-testid="import-error">
          {error}
        </Alert>
      ) : null}

      {file && (sending || job) ? (
        <Card data-testid="import-progress">
          <CardContent sx={{ display: 'grid', gap: 1.5 }}>
            <Box sx={{ display: 'flex', alignItems: 'center', gap: 1, flexWrap: 'wrap' }}>
              <Typography variant="body1" sx={{ fontWeight: 600, flex: 1, minWidth: 200, wordBreak: 'break-all' }}>
                {job?.fileName ?? file.name}
              </Typography>
              {status ? <StatusChip tone={status.tone} label={status.label} /> : <StatusChip tone="info" label="Sending" />}
            </Box>
            {replayed ? (
              <Alert severity="info" variant="outlined" data-testid="import-replayed">
                This file was imported before; here is that import. Nothing was read twice.
              </Alert>
            ) : null}
            <Box>
              <LinearProgress
                variant={sending ? 'indeterminate' : 'determinate'}
                value={percent}
                aria-label="Import progress"
                sx={{ height: 10, borderRadius: 5, bgcolor: '#e3ebeb', '& .MuiLinearProgress-bar': { borderRadius: 5, bgcolor: job?.status === 'failed' ? 'error.main' : undefined } }}
              />
              <Box sx={{ display: 'flex', justifyContent: 'space-between', mt: 0.75 }}>
                <Typography variant="body2" color="text.secondary">
                  {job ? `${formatNumber(job.processed, { decimals: 0 })} of ${formatNumber(job.total, { decimals: 0 })} rows` : 'Sending…'}
                </Typography>
                <Typography variant="body2" sx={{ fontWeight: 600, fontVariantNumeric: 'tabular-nums' }} data-testid="import-percent">
                  {formatNumber(percent, { decimals: 0 })} %
                </Typography>
              </Box>
            </Box>
            {job ? (
              <Box sx={{ display: 'flex', gap: 3, flexWrap: 'wrap' }}>
                <Count label="Readings imported" value={job.accepted} icon={<CheckCircleOutline sx={{ fontSize: 18, color: 'success.main' }} />} testId="import-accepted" hint={job.accepted ? 'judged like any reading' : undefined} />
                <Count label="Already received" value={job.duplicates ?? 0} testId="import-duplicates" hint="same device and reading id" />
                <Count label="Rows that could not be read" value={job.rejectedRows} icon={job.rejectedRows ? <ErrorOutline sx={{ fontSize: 18, color: 'error.main' }} /> : undefined} testId="import-bad" />
              </Box>
            ) : null}
            {job?.status === 'failed' && job.error ? <Alert severity="error">{job.error}</Alert> : null}
          </CardContent>
        </Card>
      ) : null}

      {job?.badRows.length ? (
        <Card>
          <CardContent>
            <Typography variant="h2" sx={{ fontSize: '1.02rem', mb: 1 }}>
              Rows that could not be read
            </Typography>
            <Typography variant="body2" color="text.secondary" sx={{ mb: 1.5 }}>
              The other rows were imported. Correct these lines in the file and send it again, or post them by hand.
            </Typography>
            <Table size="small" aria-label="Rows that could not be read" data-testid="bad-rows">
              <TableHead>
                <TableRow>
                  <TableCell sx={{ width: 80 }}>Line</TableCell>
                  <TableCell sx={{ width: 180 }}>Column</TableCell>
                  <TableCell>Problem</TableCell>
                </TableRow>
              </TableHead>
              <TableBody>
                {job.badRows.flatMap((row) =>
                  (row.errors.length ? row.errors : [{ field: '', detail: 'could not be read' }]).map((e, i) => (
                    <TableRow key={`${row.line}-${i}`}>
                      <TableCell sx={{ fontFamily: monoFont }}>{i === 0 ? row.line : ''}</TableCell>
                      <TableCell sx={{ fontFamily: monoFont, fontSize: '0.8rem' }}>{e.field || '—'}</TableCell>
                      <TableCell>{e.detail}</TableCell>
                    </TableRow>
                  )),
                )}
              </TableBody>
            </Table>
          </CardContent>
        </Card>
      ) : null}
    </Box>
  );
}

function Count({ label, value, icon, testId, hint }: { label: string; value: number; icon?: React.ReactNode; testId: string; hint?: string }) {
  return (
    <Box>
      <Typography variant="caption" color="text.secondary" component="div">
        {label}
      </Typography>
      <Box sx={{ display: 'flex', alignItems: 'center', gap: 0.5 }}>
        {icon}
        <Typography variant="body1" sx={{ fontWeight: 600, fontVariantNumeric: 'tabular-nums' }} data-testid={testId}>
          {formatNumber(value ?? 0, { decimals: 0 })}
        </Typography>
      </Box>
      {hint ? (
        <Typography variant="caption" color="text.secondary">
          {hint}
        </Typography>
      ) : null}
    </Box>
  );
}
