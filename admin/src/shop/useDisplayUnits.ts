import { useGetIdentity } from 'react-admin';
import type { PourgateIdentity } from '../authProvider';
import { DISPLAY_UNITS, type UnitSystem } from '../format/quantities';

/** The person's unit system (their profile setting) and the unit each dimension is shown in. */
export function useDisplayUnits() {
  const { identity } = useGetIdentity();
  const system: UnitSystem = (identity as PourgateIdentity | undefined)?.unitSystem === 'imperial' ? 'imperial' : 'metric';
  return { system, units: DISPLAY_UNITS[system] };
}
