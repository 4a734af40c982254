import { Box, FormHelperText } from '@mui/material';
import { NumberInput, SelectInput, required as requiredRule, useSourceContext } from 'react-admin';
import { useFormState } from 'react-hook-form';
import { unitChoices, type Dimension } from '../format/quantities';
import { useDisplayUnits } from './useDisplayUnits';

function errorAt(errors: Record<string, unknown>, path: string): string | undefined {
  let node: unknown = errors;
  for (const part of path.split('.')) node = node && typeof node === 'object' ? (node as Record<string, unknown>)[part] : undefined;
  const message = node && typeof node === 'object' ? (node as { message?: unknown }).message : undefined;
  return typeof message === 'string' && message ? message : undefined;
}

/**
 * A `{ value, unit }` pair as the API takes it: a number and a unit picker side by side, bound to
 * `<source>.value` and `<source>.unit`, so a problem's pointer (`/freeRiseDensity/value`) lands on it.
 * An error about the quantity as a whole (`/freeRiseDensity`) shows under the pair.
 */
export function QuantityInput({
  source,
  label,
  dimension,
  units,
  helperText,
  required,
  step,
  min,
}: {
  source: string;
  label: string;
  dimension: Dimension;
  /** Unit ids to offer (the dimension's usual ones when absent). */
  units?: readonly string[];
  helperText?: string;
  required?: boolean;
  step?: number;
  min?: number;
}) {
  const { errors } = useFormState();
  // inside an array input the source is relative to its row
  const sourceContext = useSourceContext();
  const whole = errorAt(errors as Record<string, unknown>, sourceContext ? sourceContext.getSource(source) : source);
  const choices = unitChoices(dimension).filter((c) => !units || units.includes(c.id));
  const { units: display } = useDisplayUnits();
  const defaultUnit = choices.some((c) => c.id === display[dimension]) ? display[dimension] : choices[0]?.id;
  return (
    <Box sx={{ mb: 0.5 }}>
      <Box sx={{ display: 'flex', gap: 1, alignItems: 'flex-start' }}>
        <NumberInput source={`${source}.value`} label={label} validate={required ? requiredRule() : undefined} helperText={helperText ?? false} step={step} min={min} size="small" margin="dense" sx={{ flex: 1, minWidth: 120 }} />
        <SelectInput source={`${source}.unit`} label="Unit" choices={choices} defaultValue={defaultUnit} validate={requiredRule()} helperText={false} size="small" margin="dense" sx={{ width: 118, flexShrink: 0, minWidth: 0 }} aria-label={`${label} unit`} />
      </Box>
      {whole ? (
        <FormHelperText error sx={{ mt: -0.5, mb: 1, mx: 1.75 }}>
          {whole}
        </FormHelperText>
      ) : null}
    </Box>
  );
}
