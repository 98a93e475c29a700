import { UNIT_CODES, UNIT_INFO, type UnitCode } from '#shared/units/units';

/** A unit as a column or a choice reads it; the bare "%" gets its word so a list reads well. */
export function unitLabel(unit: UnitCode): string {
  return unit === 'percent' ? 'percent (%)' : UNIT_INFO[unit].label;
}

/** The unit list in the schema's order: rates, durations, then the rest. */
export const UNIT_OPTIONS = UNIT_CODES.map((u) => ({ value: u, label: unitLabel(u) }));
