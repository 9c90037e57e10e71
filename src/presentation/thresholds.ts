/**
 * Rule-of-thumb cut-offs that decide only how a result is worded. Statistical decisions at
 * α = 1 − level are the engine's (its verdict codes); these are conventions for the words.
 */

/** A VIF above 10 is the usual rule of thumb for a term whose estimate collinearity degrades (common practice, no source). */
export const LARGE_VIF = 10;

/**
 * Condition-number bands after Belsley, Kuh & Welsch (Regression Diagnostics, 1980), who read
 * indexes of the unit-scaled design from about 30 up as moderate to strong dependencies and from
 * about 100 as serious ones (from memory); below 10 is taken as no sign of harm.
 */
export const CONDITION_BANDS = { mild: 10, moderate: 30, serious: 100 } as const;

/**
 * Which way a non-normal shape departs is named only past round cut-offs of our own (no source):
 * |skewness| from 0.5, kurtosis outside 2.5 to 3.5.
 */
export const NOTABLE_SKEWNESS = 0.5;
export const NORMAL_KURTOSIS = { low: 2.5, high: 3.5 } as const;
