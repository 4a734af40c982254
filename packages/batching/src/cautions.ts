/**
 * The cautions returned with every batch result. Short on purpose: they remind, they do not teach,
 * and they send the reader to the documents that govern the work.
 */

export type CautionCode = 'ISOCYANATE_SENSITISER' | 'PROTECTIVE_EQUIPMENT' | 'EXOTHERM' | 'GOVERNING_DOCUMENTS' | 'SUPPLIER_CAUTIONS';

export interface Caution {
  readonly code: CautionCode;
  readonly text: string;
}

export const STANDARD_CAUTIONS: readonly Caution[] = Object.freeze([
  {
    code: 'ISOCYANATE_SENSITISER',
    text: 'Isocyanates are respiratory and skin sensitisers: once sensitised, a person can react to very small exposures.',
  },
  {
    code: 'PROTECTIVE_EQUIPMENT',
    text: 'Work with ventilation (local extraction where the SDS calls for it), chemical-resistant gloves and eye protection.',
  },
  {
    code: 'EXOTHERM',
    text: "Large masses of mixed foam can overheat from their own reaction heat: pour in layers or smaller shots and keep each mass within the supplier's guidance.",
  },
  {
    code: 'GOVERNING_DOCUMENTS',
    text: "Follow the supplier's SDS and TDS, local codes and licensed practice. Pourgate computes targets; it does not replace them.",
  },
].map((caution) => Object.freeze(caution as Caution)));

/** The standard cautions, followed by the material system's own cautions text when it has one. */
export function cautionsFor(systemCautionsText?: string): Caution[] {
  const own = systemCautionsText?.trim();
  return own ? [...STANDARD_CAUTIONS, { code: 'SUPPLIER_CAUTIONS', text: own }] : [...STANDARD_CAUTIONS];
}
