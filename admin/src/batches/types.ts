import type { DisplayQuantity } from '../format/quantities';

/** A batch as `GET /v1/batches` sends it (api/src/batches/batches.service.ts, batchView). */
export type BatchState = 'planned' | 'weighing' | 'mixed' | 'curing' | 'on_hold' | 'released' | 'scrapped';

export interface Caution {
  code: string;
  text: string;
}

export interface Batch {
  id: string;
  state: BatchState;
  workOrderId: string | null;
  workOrderExternalRef: string | null;
  materialSystemId: string;
  materialSystemName: string;
  materialSystemRevision: number;
  subject: 'mold' | 'free_rise_cup';
  moldId: string | null;
  moldName: string | null;
  scaleDeviceId: string | null;
  stationCode: string | null;
  lots: { id: string; part: 'A' | 'B' | 'pigment'; lotNumber: string; expiresOn: string }[];
  plannedFor: string;
  notes: string | null;
  computationVersion: string;
  summary: {
    targetDensityKgM3: number;
    packFactor: number;
    foamMassKg: number;
    mixedMassKg: number;
    massAKg: number;
    massBKg: number;
    pigmentMassKg: number;
    totalMassKg: number;
    warnings: string[];
  };
  cautions: Caution[];
  createdBy: string | null;
  createdAt: string;
  updatedAt: string;
}

export interface Transition {
  id: number;
  batchId: string;
  from: BatchState | null;
  to: BatchState;
  at: string;
  actorType: 'user' | 'api_key' | 'system';
  actor: string | null;
  reason: string | null;
}

export interface TargetWarning {
  code: string;
  severity: 'warning' | 'danger';
  message: string;
  measured?: number;
  limit?: number;
  unit?: string;
  display?: { measured: number | null; limit: number | null; unit: string };
}

export interface ComponentTarget {
  part?: 'A' | 'B';
  side?: 'isocyanate' | 'polyol';
  mass: DisplayQuantity;
  massUnrounded?: DisplayQuantity;
  volume: DisplayQuantity | null;
  toleranceBand?: { low: DisplayQuantity; high: DisplayQuantity };
  percentOfAB?: number;
}

/** Targets in the caller's units with SI alongside (POST /v1/targets/preview, GET /v1/batches/{id}/targets). */
export interface TargetsView {
  unitSystem: 'metric' | 'imperial';
  computationVersion: string;
  subject: 'mold' | 'free_rise_cup';
  cavityVolume?: DisplayQuantity;
  cavities?: number;
  totalVolume?: DisplayQuantity;
  targetDensity: DisplayQuantity;
  packFactor: { value: number; unit: string };
  densityBasis?: string;
  expectedFreeRiseDensity?: {
    density: DisplayQuantity;
    temperature: DisplayQuantity;
    atComponentTemperature: boolean;
    method: string;
    fit?: { count: number; rSquared: number } | null;
  } | null;
  expectedPackFactor?: { value: number; unit: string } | null;
  foamMass: DisplayQuantity;
  mixedMass: DisplayQuantity;
  totalMass: DisplayQuantity;
  allowances?: { convention: { overfill: string; retention: string }; overfillPercent: number; retentionPercent: number };
  ratioBasis: 'weight' | 'volume';
  weightRatio: { a: number; b: number };
  volumeRatio: { a: number; b: number };
  ratioTolerancePercent: number;
  components: { A: ComponentTarget; B: ComponentTarget; pigment: ComponentTarget };
  scaleReadability?: DisplayQuantity | null;
  isocyanateIndex?: { value: number; atToleranceLimits?: { low: number; high: number } } | null;
  timing?: { potLife?: DisplayQuantity | null; demoldTime?: DisplayQuantity | null; fullCureTime?: DisplayQuantity | null };
  componentTemperatureWindow?: { min: DisplayQuantity; max: DisplayQuantity } | null;
  warnings: TargetWarning[];
  cautions: Caution[];
  sources?: {
    system: { id: string; name: string; revision: number } | { inline: true };
    mold: { id: string; name: string; code: string | null } | { inline: true } | null;
    scale: { deviceId: string; name: string; serial: string } | { inline: true } | null;
    lots: { part: string; id: string; lotNumber: string; expiresOn: string }[];
    cupTests: number;
    plannedFor: string;
  };
  documents?: { safetyDataSheets: { id: string; title?: string; fileName?: string }[]; sdsOnFile: boolean };
  /** Only on a batch's stored targets. */
  batchId?: string;
  state?: BatchState;
  computedAt?: string;
}

export const BATCH_STATE: Readonly<Record<BatchState, { label: string; tone: 'good' | 'caution' | 'bad' | 'quiet' | 'info'; blurb: string }>> = {
  planned: { label: 'Planned', tone: 'quiet', blurb: 'Targets computed; nothing weighed yet' },
  weighing: { label: 'Weighing', tone: 'info', blurb: 'Parts are being weighed' },
  mixed: { label: 'Mixed', tone: 'info', blurb: 'A met B: the pot life is running' },
  curing: { label: 'Curing', tone: 'info', blurb: 'Poured; curing until the demold time' },
  on_hold: { label: 'On hold', tone: 'caution', blurb: 'A rejected reading waits for a decision' },
  released: { label: 'Released', tone: 'good', blurb: 'Cleared for demold and use' },
  scrapped: { label: 'Scrapped', tone: 'bad', blurb: 'Not to be used' },
};

/** "Seat cushion · Demo Flex 28", the way the floor names a batch. */
export function batchTitle(b: Pick<Batch, 'moldName' | 'subject' | 'materialSystemName'> | null | undefined): string {
  if (!b) return 'Batch';
  const what = b.subject === 'free_rise_cup' ? 'Free-rise cup' : (b.moldName ?? 'Mold');
  return `${what} · ${b.materialSystemName}`;
}

/** The first block of the id, enough to tell batches apart on a sheet or a screen. */
export function shortRef(id: string | null | undefined): string {
  return id ? id.slice(0, 8).toUpperCase() : '—';
}
