import { Alert, Box, Button, Dialog, DialogActions, DialogContent, DialogTitle, Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import { useEffect, useState } from 'react';
import { useDataProvider } from 'react-admin';
import type { DeliveryDetail, WebhookDelivery } from '../views/sdk';
import { formatDateTime } from '../format/dates';
import { monoFont } from '../theme';

/** Every attempt of one delivery: when, how long, what the receiver answered. */
export function AttemptsDialog({ delivery, onClose }: { delivery: WebhookDelivery; onClose: () => void }) {
  const dataProvider = useDataProvider();
  const [detail, setDetail] = useState<DeliveryDetail | null>(null);
  const [failure, setFailure] = useState<string | null>(null);
  useEffect(() => {
    dataProvider.getOne<DeliveryDetail>('webhook-deliveries', { id: delivery.id }).then(
      ({ data }) => setDetail(data),
      (e: Error) => setFailure(e.message),
    );
  }, [dataProvider, delivery.id]);
  return (
    <Dialog open onClose={onClose} maxWidth="md" fullWidth aria-labelledby="attempts-title">
      <DialogTitle id="attempts-title">Attempts of {delivery.eventType}</DialogTitle>
      <DialogContent>
        <Typography variant="body2" color="text.secondary" sx={{ mb: 1.5 }}>
          webhook-id <Box component="span" sx={{ fontFamily: monoFont }}>{delivery.eventId}</Box>, the same on every attempt and replay.
        </Typography>
        {failure ? <Alert severity="error">{failure}</Alert> : null}
        {detail && detail.attemptLog.length === 0 ? <Typography variant="body2">No attempt yet.</Typography> : null}
        {detail && detail.attemptLog.length > 0 ? (
          <Table size="small" aria-label="Attempts" data-testid="attempts">
            <TableHead>
              <TableRow>
                <TableCell>#</TableCell>
                <TableCell>Started</TableCell>
                <TableCell>Answer</TableCell>
                <TableCell>Took</TableCell>
                <TableCell>Receiver said</TableCell>
              </TableRow>
            </TableHead>
            <TableBody>
              {detail.attemptLog.map((a) => (
                <TableRow key={a.attempt}>
                  <TableCell>{a.attempt}</TableCell>
                  <TableCell sx={{ whiteSpace: 'nowrap' }}>{formatDateTime(a.startedAt)}</TableCell>
                  <TableCell sx={{ fontFamily: monoFont }}>{a.statusCode ?? '—'}</TableCell>
                  <TableCell sx={{ whiteSpace: 'nowrap' }}>{a.durationMs === null ? '—' : `${a.durationMs} ms`}</TableCell>
                  <TableCell sx={{ fontFamily: monoFont, fontSize: '0.75rem', wordBreak: 'break-all', maxWidth: 360 }}>{a.error ?? a.responseSnippet ?? '—'}</TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
        ) : null}
      </DialogContent>
      <DialogActions sx={{ px: 3, pb: 2 }}>
        <Button variant="contained" onClick={onClose}>
          Close
        </Button>
      </DialogActions>
    </Dialog>
  );
}
