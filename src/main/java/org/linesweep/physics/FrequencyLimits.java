package org.linesweep.physics;

/**
 * Where a design's frequency ceiling lies. Every frequency is in Hz and is NaN where the limit does not
 * apply or lies outside the searched band ({@link LimitFinder#LOWEST_FREQUENCY_HZ} to
 * {@link LimitFinder#HIGHEST_FREQUENCY_HZ}).
 *
 * @param electricalLengthHz where L/λ equals the threshold
 * @param skinDepthEqualsRadiusHz where the skin depth equals the characteristic conductor's radius (or
 *        half-thickness): informative, not a ceiling
 * @param resistanceDoublesHz where that conductor's AC resistance is twice its DC resistance: informative
 * @param higherModeCutoffHz first higher-order mode; NaN for open lines
 * @param lossBudgetHz where the total loss reaches the budget; NaN if no budget was given
 * @param ceilingHz the lowest of electrical length, higher-order mode and loss budget
 * @param limitedBy which of them sets the ceiling; null if none applies
 * @param radiationSpacingHz for open lines, where the conductor spacing reaches a tenth of the
 *        wavelength in the medium (they radiate noticeably above it; common practice); NaN otherwise
 */
public record FrequencyLimits(double electricalLengthHz, double skinDepthEqualsRadiusHz, double resistanceDoublesHz,
        double higherModeCutoffHz, double lossBudgetHz, double ceilingHz, LimitKind limitedBy,
        double radiationSpacingHz) {
}
