import StraightenOutlined from '@mui/icons-material/StraightenOutlined';
import { Box, Typography } from '@mui/material';
import { useWatch } from 'react-hook-form';
import { formatSiAs } from '../format/quantities';
import { useDisplayUnits } from '../shop/useDisplayUnits';
import { previewMoldVolume, type FormMeasurement } from './volumeHelper';

/** The mold's volume as the form stands, recomputed on every keystroke. */
export function VolumeReadout() {
  const [cavity, inserts, cavities] = useWatch({ name: ['cavity', 'inserts', 'cavities'] }) as [FormMeasurement | undefined, FormMeasurement[] | undefined, unknown];
  const { system } = useDisplayUnits();
  const units = system === 'imperial' ? ['in3', 'gal'] : ['L', 'cm3'];
  const r = previewMoldVolume({ cavity, inserts, cavities });
  const v = (m3: number) => (
    <>
      <strong>{formatSiAs(m3, units[0]!)}</strong>
      <Box component="span" sx={{ color: 'text.secondary' }}>
        {' '}
        ({formatSiAs(m3, units[1]!)})
      </Box>
    </>
  );
  return (
    <Box
      aria-live="polite"
      data-testid="volume-readout"
      sx={{ border: '1px solid', borderColor: r.ok ? '#b9dcc6' : 'divider', bgcolor: r.ok ? '#f1f8f3' : '#faf9f5', borderRadius: 1.5, p: 2, mb: 2, width: '100%' }}
    >
      <Box sx={{ display: 'flex', alignItems: 'center', gap: 1, mb: 1 }}>
        <StraightenOutlined sx={{ color: 'primary.main' }} fontSize="small" aria-hidden />
        <Typography variant="subtitle2" sx={{ fontWeight: 600 }}>
          Cavity volume
        </Typography>
      </Box>
      {r.ok ? (
        <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', sm: 'repeat(4, auto)' }, justifyContent: 'start', columnGap: 4, rowGap: 1 }}>
          <Box>
            <Typography variant="caption" color="text.secondary" component="div">As measured</Typography>
            <Typography variant="body2">{v(r.volume.grossCavityVolume)}</Typography>
          </Box>
          <Box>
            <Typography variant="caption" color="text.secondary" component="div">Less inserts</Typography>
            <Typography variant="body2">{v(r.volume.insertVolume)}</Typography>
          </Box>
          <Box>
            <Typography variant="caption" color="text.secondary" component="div">Foam fills, one cavity</Typography>
            <Typography variant="body2" data-testid="cavity-volume">{v(r.volume.cavityVolume)}</Typography>
          </Box>
          <Box>
            <Typography variant="caption" color="text.secondary" component="div">All {r.volume.cavities} {r.volume.cavities === 1 ? 'cavity' : 'cavities'}</Typography>
            <Typography variant="body2" data-testid="total-volume">{v(r.volume.totalVolume)}</Typography>
          </Box>
          {r.waterDensity !== undefined ? (
            <Typography variant="caption" color="text.secondary" sx={{ gridColumn: '1 / -1' }}>
              Water at that temperature weighs {formatSiAs(r.waterDensity, 'kg/m3', { significant: 7 })} (table after Kell, 1975).
            </Typography>
          ) : null}
        </Box>
      ) : (
        <Typography variant="body2" color={r.missing ? 'text.secondary' : 'error.main'} data-testid="volume-problem">
          {r.message}
        </Typography>
      )}
    </Box>
  );
}
