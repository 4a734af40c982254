import EventAvailableOutlined from '@mui/icons-material/EventAvailableOutlined';
import { Box, Button, Typography } from '@mui/material';
import { Link } from 'react-router-dom';
import type { CalculatorForm } from '../calculator/previewRequest';
import { useHolds } from '../review/hooks';
import { planLinkFromCalculator } from './planRequest';

/** "Plan a batch" on the batches list: for people who may plan (shop:write). */
export function PlanBatchButton({ to = '/batches/plan', label = 'Plan a batch' }: { to?: string; label?: string }) {
  const allowed = useHolds('shop:write');
  if (!allowed) return null;
  return (
    <Button component={Link} to={to} variant="contained" size="small" startIcon={<EventAvailableOutlined />} data-testid="plan-batch-button">
      {label}
    </Button>
  );
}

/** The calculator's way on: the planning form, filled with the inputs the figures were computed from. */
export function PlanFromCalculatorButton({ form }: { form: CalculatorForm }) {
  const allowed = useHolds('shop:write');
  if (!allowed) return null;
  const link = planLinkFromCalculator(form);
  return (
    <Box sx={{ display: 'flex', gap: 1.5, alignItems: 'center', flexWrap: 'wrap' }}>
      <Button component={Link} to={link ?? '/batches/plan'} variant="contained" size="small" startIcon={<EventAvailableOutlined />} disabled={!link} data-testid="calc-plan">
        Plan a batch with these figures
      </Button>
      <Typography variant="caption" color="text.secondary">
        {link
          ? 'Opens the planning form with this system, mold and these options; choose the lots and the day there.'
          : 'A batch is planned for a stored mold or a cup: save these dimensions as a mold first.'}
      </Typography>
    </Box>
  );
}
