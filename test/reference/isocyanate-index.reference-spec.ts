/**
 * The equivalent-weight method of the polyurethane handbooks: NCO eq. wt = 4202 / %NCO,
 * OH eq. wt = 56100 / OH number, water eq. wt = 9.0; index = 100 × NCO eq ÷ (OH + water eq).
 */
import { describe, expect, it } from '@jest/globals';
import {
  NCO_EQUIVALENT_NUMERATOR,
  OH_EQUIVALENT_NUMERATOR,
  WATER_EQUIVALENT_WEIGHT,
  indexAfterRatioError,
  isocyanateIndex,
  isocyanatePartsForIndex,
  ncoEquivalentWeight,
} from '@pourgate/batching';

/** IUPAC standard atomic weights, conventional values (IUPAC CIAAW). */
const C = 12.011;
const H = 1.008;
const N = 14.007;
const O = 15.999;
const K = 39.098;

describe('the constants of the method follow from the IUPAC atomic weights', () => {
  it('4202 = 100 × M(NCO), M(NCO) = 42.017 g/mol', () => {
    expect(NCO_EQUIVALENT_NUMERATOR / 100).toBeCloseTo(N + C + O, 2);
  });

  it('56100 = 1000 × M(KOH), M(KOH) = 56.105 g/mol', () => {
    expect(OH_EQUIVALENT_NUMERATOR / 1000).toBeCloseTo(K + O + H, 1);
  });

  it('water: 9.0 ≈ M(H₂O)/2 = 18.015/2 (two NCO per water)', () => {
    expect(WATER_EQUIVALENT_WEIGHT).toBeCloseTo((2 * H + O) / 2, 1);
  });

  it('TDI (C₉H₆N₂O₂, two NCO) is 48.3 %NCO; pure 4,4′-MDI (C₁₅H₁₀N₂O₂) is 33.6 %NCO', () => {
    const tdi = 9 * C + 6 * H + 2 * N + 2 * O;
    const mdi = 15 * C + 10 * H + 2 * N + 2 * O;
    expect((100 * 2 * (N + C + O)) / tdi).toBeCloseTo(48.3, 1);
    expect((100 * 2 * (N + C + O)) / mdi).toBeCloseTo(33.6, 1);
    expect(ncoEquivalentWeight(33.6)).toBeCloseTo(mdi / 2, 0);
  });
});

describe('a water-blown TDI foam worked by the handbook method', () => {
  // 100 pbw polyol of OH number 56 plus 3.0 pbw water, TDI at 48.3 %NCO, index 105.
  // By hand: OH eq = 100 / (56100/56) = 0.099822; water eq = 3.0 / 9.0 = 0.333333; sum 0.433155;
  // NCO eq needed = 1.05 × 0.433155 = 0.454813; × (4202/48.3 = 86.998) = 39.568 pbw.
  it('needs about 39.57 pbw of TDI', () => {
    const parts = isocyanatePartsForIndex({ index: 105, ncoPercent: 48.3, hydroxylNumber: 56, polyolParts: 100, waterParts: 3.0 });
    expect(parts).toBeCloseTo(39.568, 3);
  });

  it('and that TDI gives back index 105', () => {
    expect(isocyanateIndex({ isocyanateMass: 39.568, ncoPercent: 48.3, polyolMass: 100, hydroxylNumber: 56, waterMass: 3 })).toBeCloseTo(105, 2);
  });
});

describe('off-ratio pours (the index is proportional to NCO eq over OH eq)', () => {
  it('an isocyanate side 5 % heavy gives index × 1.05', () => {
    expect(indexAfterRatioError(105, 0.05, 'A')).toBeCloseTo(105 * 1.05, 10);
  });

  it('a polyol side 5 % heavy gives index ÷ 1.05', () => {
    // A is the polyol and 5 % heavy: e = +0.05 with B the isocyanate.
    expect(indexAfterRatioError(105, 0.05, 'B')).toBeCloseTo(105 / 1.05, 10);
    // B is the polyol and 5 % heavy: m_A/m_B is 1/1.05 of target.
    expect(indexAfterRatioError(105, 1 / 1.05 - 1, 'A')).toBeCloseTo(105 / 1.05, 10);
  });
});
