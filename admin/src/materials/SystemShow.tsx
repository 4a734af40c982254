import DescriptionOutlined from '@mui/icons-material/DescriptionOutlined';
import UploadFileOutlined from '@mui/icons-material/UploadFileOutlined';
import EditOutlined from '@mui/icons-material/EditOutlined';
import { Box, Button, Chip, MenuItem, Table, TableBody, TableCell, TableHead, TableRow, TextField, Typography } from '@mui/material';
import { useEffect, useRef, useState } from 'react';
import { Link } from 'react-router-dom';
import { Show, useCanAccess, useDataProvider, useNotify, useRecordContext } from 'react-admin';
import { Guarded } from '../common/Guarded';
import { PageHeader } from '../common/PageHeader';
import type { PourgateDataProvider } from '../dataProvider';
import type { MaterialSystemDocument, MaterialSystemRevision } from '../views/sdk';
import { formatDate, formatDateTime } from '../format/dates';
import { DetailGrid, Section } from '../shop/DetailGrid';
import { SdsCaution } from '../shop/SdsCaution';
import { formatNumber, formatSiAs, formatSeconds } from '../format/quantities';
import { useDisplayUnits } from '../shop/useDisplayUnits';
import { kindLabel, ratioLabel, type MaterialSystem } from './systemRules';

function useTemperature() {
  const { system } = useDisplayUnits();
  const unit = system === 'imperial' ? 'degF' : 'degC';
  return (c: number | null | undefined) => formatSiAs(c ?? null, unit, { significant: 3 });
}

function windowText(t: (c: number | null | undefined) => string, min: number | null | undefined, max: number | null | undefined) {
  return min === null || min === undefined || max === null || max === undefined ? 'Not set' : `${t(min)} – ${t(max)}`;
}

/** Engineers attach the supplier's SDS and TDS; the API checks that each file really is a PDF. */
function UploadDocument({ system, onUploaded }: { system: MaterialSystem; onUploaded: () => void }) {
  const dataProvider = useDataProvider<PourgateDataProvider>();
  const notify = useNotify();
  const { canAccess } = useCanAccess({ resource: 'material-systems', action: 'edit' });
  const input = useRef<HTMLInputElement>(null);
  const [kind, setKind] = useState<'SDS' | 'TDS'>('SDS');
  const [busy, setBusy] = useState(false);
  if (!canAccess) return null;
  const send = async (file: File | undefined) => {
    if (!file) return;
    setBusy(true);
    try {
      await dataProvider.uploadMaterialSystemDocument(system.id, { kind, file });
      notify(`${kind} uploaded: ${file.name}`, { type: 'success' });
      onUploaded();
    } catch (error) {
      notify((error as Error).message, { type: 'error' });
    } finally {
      setBusy(false);
      if (input.current) input.current.value = '';
    }
  };
  return (
    <Box sx={{ display: 'flex', gap: 1, alignItems: 'center', mt: 1.5 }}>
      <TextField select size="small" label="Kind" value={kind} onChange={(e) => setKind(e.target.value as 'SDS' | 'TDS')} sx={{ width: 250 }}>
        <MenuItem value="SDS">Safety data sheet (SDS)</MenuItem>
        <MenuItem value="TDS">Technical data sheet (TDS)</MenuItem>
      </TextField>
      <Button variant="outlined" size="small" startIcon={<UploadFileOutlined />} onClick={() => input.current?.click()} disabled={busy} data-testid="upload-document">
        Upload PDF
      </Button>
      <input ref={input} type="file" accept="application/pdf,.pdf" hidden aria-label="PDF to upload" onChange={(e) => void send(e.target.files?.[0])} />
    </Box>
  );
}

function Documents({ system }: { system: MaterialSystem }) {
  const dataProvider = useDataProvider<PourgateDataProvider>();
  const notify = useNotify();
  const [docs, setDocs] = useState<MaterialSystemDocument[] | null>(null);
  const [version, setVersion] = useState(0);
  useEffect(() => {
    dataProvider.materialSystemDocuments(system.id).then(({ data }) => setDocs(data), () => setDocs([]));
  }, [dataProvider, system.id, version]);
  const uploader = <UploadDocument system={system} onUploaded={() => setVersion((v) => v + 1)} />;
  const open = async (d: MaterialSystemDocument) => {
    try {
      const blob = await dataProvider.downloadDocument(d.href);
      const url = URL.createObjectURL(blob);
      const a = document.createElement('a');
      a.href = url;
      a.download = d.fileName;
      a.click();
      setTimeout(() => URL.revokeObjectURL(url), 30_000);
    } catch (error) {
      notify((error as Error).message, { type: 'error' });
    }
  };
  if (docs === null) return <Typography variant="body2" color="text.secondary">Loading documents…</Typography>;
  if (docs.length === 0)
    return (
      <>
        <Typography variant="body2" color="warning.main" data-testid="no-sds">
          No SDS on file for this system. Ask the supplier for it and upload it here, so everyone who handles the parts can reach it.
        </Typography>
        {uploader}
      </>
    );
  const hasSds = docs.some((d) => d.kind === 'SDS');
  return (
    <>
    {hasSds ? null : (
      <Typography variant="body2" color="warning.main" sx={{ mb: 1 }} data-testid="no-sds">
        No SDS on file yet, only technical data.
      </Typography>
    )}
    <Box sx={{ display: 'flex', flexWrap: 'wrap', gap: 1 }}>
      {docs.map((d) => (
        <Button key={d.id} variant="outlined" size="small" startIcon={<DescriptionOutlined />} onClick={() => open(d)} data-testid="document-link">
          {d.kind}: {d.title ?? d.fileName}
          <Box component="span" sx={{ ml: 1, color: 'text.secondary', fontSize: '0.75rem' }}>
            {formatDate(d.createdAt)}
          </Box>
        </Button>
      ))}
    </Box>
    {uploader}
    </>
  );
}

function Revisions({ system }: { system: MaterialSystem }) {
  const dataProvider = useDataProvider<PourgateDataProvider>();
  const [rows, setRows] = useState<MaterialSystemRevision[] | null>(null);
  const { units } = useDisplayUnits();
  useEffect(() => {
    dataProvider.materialSystemRevisions(system.id).then(({ data }) => setRows(data), () => setRows([]));
  }, [dataProvider, system.id, system.revision]);
  if (!rows) return <Typography variant="body2" color="text.secondary">Loading revisions…</Typography>;
  return (
    <Table size="small" aria-label="Revisions" data-testid="revisions">
      <TableHead>
        <TableRow>
          <TableCell>Revision</TableCell>
          <TableCell>Made</TableCell>
          <TableCell>By</TableCell>
          <TableCell>Mix ratio</TableCell>
          <TableCell>Free-rise density</TableCell>
          <TableCell>Why</TableCell>
        </TableRow>
      </TableHead>
      <TableBody>
        {rows.map((r) => (
          <TableRow key={r.id}>
            <TableCell sx={{ whiteSpace: 'nowrap' }}>
              rev. {r.revision} {r.revision === system.revision ? <Chip label="current" size="small" sx={{ ml: 0.5, height: 18, fontSize: '0.68rem' }} /> : null}
            </TableCell>
            <TableCell sx={{ whiteSpace: 'nowrap' }}>{formatDateTime(r.createdAt)}</TableCell>
            <TableCell>{r.createdBy ?? '—'}</TableCell>
            <TableCell sx={{ whiteSpace: 'nowrap' }}>{ratioLabel(r as unknown as MaterialSystem)}</TableCell>
            <TableCell sx={{ whiteSpace: 'nowrap' }}>{formatSiAs(r.freeRiseDensityKgM3 as number, units.density)}</TableCell>
            <TableCell>{r.changeNote ?? <Typography variant="body2" color="text.secondary" component="span">—</Typography>}</TableCell>
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}

function SystemDetail() {
  const s = useRecordContext<MaterialSystem>();
  const t = useTemperature();
  const { units } = useDisplayUnits();
  const { canAccess } = useCanAccess({ resource: 'material-systems', action: 'edit' });
  if (!s) return null;
  const n = (v: number | null | undefined, suffix = '') => (v === null || v === undefined ? '—' : `${formatNumber(v, { significant: 4 })}${suffix}`);
  return (
    <Box>
      <PageHeader
        title={s.name}
        lead={`${kindLabel(s.kind)} · revision ${s.revision} since ${formatDateTime(s.revisedAt)}`}
        actions={
          canAccess ? (
            <Button component={Link} to={`/material-systems/${s.id}`} variant="contained" size="small" startIcon={<EditOutlined />}>
              Revise
            </Button>
          ) : null
        }
      />
      <SdsCaution>{s.cautionsText ? <><strong>This system:</strong> {s.cautionsText}</> : null}</SdsCaution>
      <Section title="Safety data sheets and technical data" testId="documents">
        <Documents system={s} />
      </Section>
      <Section title="Mix">
        <DetailGrid
          items={[
            { label: 'Mix ratio A : B', value: `${ratioLabel(s)} ± ${s.ratioTolerancePercent} %` },
            { label: 'By weight', value: `${formatNumber(s.derived.weightRatio.a, { significant: 4 })} : ${formatNumber(s.derived.weightRatio.b, { significant: 4 })}` },
            { label: 'By volume', value: `${formatNumber(s.derived.volumeRatio.a, { significant: 4 })} : ${formatNumber(s.derived.volumeRatio.b, { significant: 4 })}` },
            { label: 'Specific gravity A / B', value: `${n(s.specificGravityA)} / ${n(s.specificGravityB)}` },
            { label: 'Isocyanate side', value: `Part ${s.isocyanatePart}` },
            { label: 'Isocyanate index', value: s.derived.isocyanateIndex === null ? 'Needs %NCO and OH number' : formatNumber(s.derived.isocyanateIndex, { significant: 4 }) },
          ]}
        />
      </Section>
      <Section title="Density and working times">
        <DetailGrid
          items={[
            { label: 'Free-rise density', value: `${formatSiAs(s.freeRiseDensityKgM3, units.density)} at ${t(s.freeRiseReferenceTemperatureC)}` },
            { label: 'Density change per °C', value: s.freeRiseDensitySlopeKgM3PerC === null ? 'From cup tests' : `${formatNumber(s.freeRiseDensitySlopeKgM3PerC, { significant: 3 })} kg/m³ per °C` },
            { label: 'Pot life', value: formatSeconds(s.potLifeS) },
            { label: 'Demold', value: formatSeconds(s.demoldTimeS) },
            { label: 'Full cure', value: formatSeconds(s.fullCureTimeS) },
            { label: 'Largest single pour', value: s.exothermMassLimitKg === null ? '2 kg (default)' : formatSiAs(s.exothermMassLimitKg, units.mass) },
          ]}
        />
      </Section>
      <Section title="Conditions and limits">
        <DetailGrid
          items={[
            { label: 'Component temperature', value: windowText(t, s.componentTemperatureMinC, s.componentTemperatureMaxC) },
            ...(s.moldTemperatureMinC !== undefined ? [{ label: 'Mold temperature', value: windowText(t, s.moldTemperatureMinC, s.moldTemperatureMaxC) }] : []),
            ...(s.ambientTemperatureMinC !== undefined ? [{ label: 'Room temperature', value: windowText(t, s.ambientTemperatureMinC, s.ambientTemperatureMaxC) }] : []),
            ...(s.maxRelativeHumidityPercent !== undefined ? [{ label: 'Highest humidity', value: n(s.maxRelativeHumidityPercent, ' % RH') }] : []),
            ...(s.massTolerancePercent !== undefined ? [{ label: 'Total mass tolerance', value: n(s.massTolerancePercent, ' %') }] : []),
            { label: 'Highest pigment', value: n(s.maxPigmentPercent, ' % of A+B') },
            { label: 'Highest pack factor', value: n(s.maxPackFactor) },
            { label: '%NCO (isocyanate side)', value: n(s.ncoPercent, ' %') },
            { label: 'OH number (polyol side)', value: n(s.hydroxylNumberMgKohG, ' mg KOH/g') },
            { label: 'Water in polyol side', value: n(s.waterPbw, ' pbw') },
          ]}
        />
      </Section>
      <Section title="Revisions" testId="revisions-section">
        <Revisions system={s} />
      </Section>
    </Box>
  );
}

export default function SystemShowPage() {
  return (
    <Guarded resource="material-systems" action="show">
      <Show resource="material-systems" actions={false} title="Material system" component="div">
        <SystemDetail />
      </Show>
    </Guarded>
  );
}
