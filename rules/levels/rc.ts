/**
 * Edges of a single-pole RC network (rules-catalogue.md, "Constants"), in units of RC. The
 * engine uses the exact logarithms, not the rounded figures.
 */

/** 10–90 %: ln 9 ≈ 2.197 (the 2.2 RC rule of thumb, common practice). */
export const RISE_10_90 = Math.log(9);

/** 30–70 %: ln(7/3) ≈ 0.8473 (the I2C-bus specification's rise-time figure). */
export const RISE_30_70 = Math.log(7 / 3);
