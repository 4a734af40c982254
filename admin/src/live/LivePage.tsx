/**
 * The live station view: what an engineer keeps open beside the bench. Each reading appears as the
 * scale posts it and turns into its verdict (with the reasons) when judged, pushed by the API as
 * Server-Sent Events (GET /v1/live/stream); nothing here polls. EventSource cannot send the bearer
 * token, so the page first asks for a short-lived ticket (POST /v1/live/tickets) and asks again for
 * each reconnection.
 */
import { Box, Card, CardContent, FormControl, InputLabel, MenuItem, Select, Stack, Typography } from '@mui/material';
import type { components } from '@pourgate/sdk';
import { useEffect, useMemo, useState } from 'react';
import { Title, useGetList } from 'react-admin';
import { CanAccessPage } from '../calculator/CanAccessPage';
import { PageHeader } from '../common/PageHeader';
import { StatusChip, type Tone } from '../common/StatusChip';
import { formatDateTime } from '../format/dates';
import { formatQuantity } from '../format/quantities';
import { API_BASE, http } from '../providers';
import { useUnitSystem } from '../review/hooks';
import { reasonsLine } from '../review/reasons';

type LiveEvent = components['schemas']['live.event'];
type LiveTicket = components['schemas']['live.ticket'];
type LiveReady = components['schemas']['live.ready'];
type Device = components['schemas']['device.view'];

const KEEP = 50;
const STATUS: Record<string, { label: string; tone: Tone }> = {
  pending: { label: 'Waiting for verdict', tone: 'info' },
  accepted: { label: 'Accepted', tone: 'good' },
  rejected: { label: 'Rejected', tone: 'bad' },
  unused: { label: 'Not used', tone: 'quiet' },
};

export default function LiveRoute() {
  return (
    <CanAccessPage action="readings:read">
      <LiveView />
    </CanAccessPage>
  );
}

/** What to watch, as a select value: "all", "station:<id>" or "device:<id>". */
function watchBody(watch: string): { stationId?: string; deviceId?: string } {
  const [kind, id] = watch.split(':');
  return kind === 'station' ? { stationId: id } : kind === 'device' ? { deviceId: id } : {};
}

function LiveView() {
  const units = useUnitSystem();
  const { data: devices = [] } = useGetList<Device>('devices', { pagination: { page: 1, perPage: 200 }, sort: { field: 'name', order: 'ASC' }, filter: { retired: false } });
  const stations = useMemo(() => {
    const seen = new Map<string, string>();
    for (const d of devices) if (d.station) seen.set(d.station.id, d.station.name ? `${d.station.code ?? ''} ${d.station.name}`.trim() : (d.station.code ?? 'Station'));
    return [...seen.entries()];
  }, [devices]);
  const [watch, setWatch] = useState('all');
  const [state, setState] = useState<'connecting' | 'open' | 'reconnecting'>('connecting');
  const [watched, setWatched] = useState<LiveReady['devices']>([]);
  const [events, setEvents] = useState<LiveEvent[]>([]);

  useEffect(() => {
    let source: EventSource | null = null;
    let retry: ReturnType<typeof setTimeout> | undefined;
    let stopped = false;
    setEvents([]);
    setState('connecting');
    const connect = async () => {
      try {
        const res = await http.fetchJson(`${API_BASE}/live/tickets`, { method: 'POST', body: JSON.stringify(watchBody(watch)) });
        if (stopped) return;
        const ticket = res.json as LiveTicket;
        source = new EventSource(ticket.streamUrl);
        source.addEventListener('ready', (e) => {
          setWatched((JSON.parse((e as MessageEvent<string>).data) as LiveReady).devices);
          setState('open');
        });
        source.addEventListener('reading', (e) => {
          const m = JSON.parse((e as MessageEvent<string>).data) as LiveEvent;
          // one row per reading: its verdict replaces the pending row in place
          setEvents((cur) => [m, ...cur.filter((x) => x.reading.id !== m.reading.id)].slice(0, KEEP));
        });
        source.onerror = () => {
          // a ticket opens one connection: ask for a new one rather than let EventSource retry with the old
          source?.close();
          if (!stopped) {
            setState('reconnecting');
            retry = setTimeout(() => void connect(), 2000);
          }
        };
      } catch {
        if (!stopped) {
          setState('reconnecting');
          retry = setTimeout(() => void connect(), 5000);
        }
      }
    };
    void connect();
    return () => {
      stopped = true;
      clearTimeout(retry);
      source?.close();
    };
  }, [watch]);

  return (
    <Box sx={{ p: { xs: 1, sm: 2 }, display: 'grid', gap: 2 }}>
      <Title title="Live station view" />
      <PageHeader title="Live station view" lead="Readings appear as the scale posts them and change to their verdict when judged. Keep it open beside the bench." />
      <Card>
        <CardContent>
          <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2} alignItems={{ sm: 'center' }}>
            <FormControl size="small" sx={{ minWidth: 260 }}>
              <InputLabel id="live-watch-label">Watch</InputLabel>
              <Select labelId="live-watch-label" label="Watch" value={watch} onChange={(e) => setWatch(String(e.target.value))} data-testid="live-watch">
                <MenuItem value="all">Every device</MenuItem>
                {stations.map(([id, label]) => (
                  <MenuItem key={id} value={`station:${id}`}>
                    Station {label}
                  </MenuItem>
                ))}
                {devices.map((d) => (
                  <MenuItem key={d.id} value={`device:${d.id}`}>
                    {d.name}
                  </MenuItem>
                ))}
              </Select>
            </FormControl>
            <Box role="status" aria-live="polite" data-testid="live-state" data-state={state}>
              <StatusChip label={state === 'open' ? `Live · ${watch === 'all' ? 'every device' : `${watched.length} device${watched.length === 1 ? '' : 's'}`}` : state === 'connecting' ? 'Connecting…' : 'Connection lost, reconnecting…'} tone={state === 'open' ? 'good' : 'caution'} />
            </Box>
          </Stack>
        </CardContent>
      </Card>
      <Card>
        <CardContent>
          {events.length === 0 ? (
            <Typography color="text.secondary" data-testid="live-empty">
              No reading since this view opened. Readings posted from now on appear here at once.
            </Typography>
          ) : (
            <Box component="ul" aria-label="Readings, newest first" sx={{ listStyle: 'none', m: 0, p: 0, display: 'grid', gap: 1 }}>
              {events.map((m) => {
                const r = m.reading;
                const st = r.review ? { label: r.review.decision === 'waive' ? 'Waived' : 'Upheld', tone: 'quiet' as Tone } : (STATUS[r.status] ?? { label: r.status, tone: 'quiet' as Tone });
                return (
                  <Box component="li" key={r.id} data-testid="live-row" data-reading-id={r.id} data-status={r.status} sx={{ p: 1.5, border: 1, borderColor: 'divider', borderRadius: 1, display: 'grid', gap: 0.5 }}>
                    <Stack direction="row" spacing={1} alignItems="center" flexWrap="wrap" useFlexGap>
                      <Typography component="span" sx={{ fontWeight: 600 }}>
                        {m.device.name}
                        {m.device.stationCode ? ` · ${m.device.stationCode}` : ''}
                      </Typography>
                      <Typography component="span">
                        {r.subject.replace('_', ' ')} {r.quantity === 'milestone' ? '' : formatQuantity(r.given.value, r.given.unit)}
                      </Typography>
                      <StatusChip label={st.label} tone={st.tone} />
                      <Typography component="span" variant="body2" color="text.secondary">
                        {formatDateTime(r.receivedAt)}
                      </Typography>
                    </Stack>
                    {r.status === 'rejected' && r.reasons.length > 0 && (
                      <Typography variant="body2" data-testid="live-reasons">
                        {reasonsLine(r.reasons, units)}
                      </Typography>
                    )}
                  </Box>
                );
              })}
            </Box>
          )}
        </CardContent>
      </Card>
    </Box>
  );
}
