/**
 * Physical bounds on every input of the computation. Outside them the input makes no physical
 * sense for a cast two-part polyurethane, and the computation refuses it (a 422 with a pointer)
 * instead of producing a number. Each bound names where it comes from; the bounds are wide on
 * purpose — they catch nonsense, not unusual formulations.
 */

/**
 * Specific gravity of a liquid polyurethane component (relative to water). Unfilled polyols and
 * isocyanates lie between about 0.9 and 1.25; filled or pigment-loaded sides reach about 1.6
 * (from memory, typical data sheets). 0.5–2.5 leaves room for any real component.
 */
export const SPECIFIC_GRAVITY_BOUNDS = { min: 0.5, max: 2.5 } as const;

/**
 * The larger part of a mix ratio over the smaller. Two-part systems are mixed from about 1:1 to
 * about 1:20 (common practice); beyond 1000:1 no meter or scale could hold a ratio.
 */
export const MAX_RATIO_QUOTIENT = 1000;

/**
 * Free-rise density of a polyurethane foam, kg/m³: the lightest flexible foams are near 8 kg/m³,
 * an unfoamed (solid) elastomer near 1200 kg/m³ (from memory). Molded densities have the same
 * ceiling: a cavity cannot be packed past solid polymer.
 */
export const FOAM_DENSITY_BOUNDS = { min: 5, max: 1300 } as const;

/**
 * Component temperatures the density model (a straight line through the reference point) is used
 * for: within ±20 °C of the reference temperature and between 0 and 60 °C. Components are handled
 * between about 15 and 35 °C (common practice); far from the reference the free-rise density does
 * not follow a line, and at 200 °C the line gives a negative density.
 */
export const DENSITY_MODEL_SPAN_C = 20;
export const COMPONENT_TEMPERATURE_BOUNDS = { min: 0, max: 60 } as const;

/**
 * The free-rise density slope, kg/m³ per °C, as a share of the reference density: warmer
 * components blow more and rise lighter, by about 0.5–2 % of the density per °C (from memory).
 * A slope steeper than 5 % per °C, or a positive one, makes no physical sense.
 */
export const MAX_SLOPE_SHARE_PER_C = 0.05;

/**
 * Volume of one mold cavity, m³: a cast part of more than 5 m³ is not poured from a weighed batch
 * (common practice: batches are weighed by hand up to some tens of kilograms).
 */
export const MAX_CAVITY_VOLUME_M3 = 5;
/** Cavities filled from one mix (common practice: a handful; 200 is far past any real shot). */
export const MAX_CAVITIES = 200;
/** A free-rise cup or bucket, m³ (ASTM D7487 uses a cup of about 1 L; 0.05 m³ is a large pail). */
export const MAX_CUP_VOLUME_M3 = 0.05;

/**
 * %NCO of an isocyanate side: toluene diisocyanate, the richest common isocyanate, carries 48.3 %
 * NCO (equivalent-weight method: 4202 ÷ 87.08); nothing a shop pours carries more than 50 %.
 */
export const NCO_PERCENT_BOUNDS = { min: 1, max: 50 } as const;

/**
 * OH number of a polyol side, mg KOH/g: glycerol, about the most hydroxyl-rich polyol, has 1829
 * (equivalent-weight method: 56 100 ÷ 30.7); flexible-foam polyols are near 30–60 (from memory).
 */
export const HYDROXYL_NUMBER_BOUNDS = { min: 5, max: 1900 } as const;

/**
 * The isocyanate index a system gives at its own ratio. Flexible and molded foams run at about
 * 80–120, isocyanurate foams up to about 350 (common practice); outside 50–500 the %NCO, OH
 * number or ratio is wrong.
 */
export const INDEX_BOUNDS = { min: 50, max: 500 } as const;

/** Largest weighed mass, kg: a hand-weighed batch (common practice: far below a tonne). */
export const MAX_BATCH_MASS_KG = 1000;

/**
 * A weighed target must span at least this many divisions of its scale. A scale shows steps of d,
 * so a reading is off by up to ±½ d from rounding alone: at 10 d that is ±5 %, the whole of the
 * common ±5 % band (common practice), and a target that rounds to zero is no target at all. NIST
 * Handbook 44 sets minimum loads of 10–50 d by accuracy class for the same reason (from memory).
 */
export const MINIMUM_TARGET_DIVISIONS = 10;
