package org.linesweep.physics;

/**
 * Physical constants in SI units. Everything else is derived from c and μ0 so that no rounded prefactor
 * (60, 120π, 8.85e-12) creeps in.
 */
public final class PhysicalConstants {

    /** Speed of light in vacuum, m/s: exact by the SI definition of the metre. */
    public static final double SPEED_OF_LIGHT_METRES_PER_SECOND = 299_792_458.0;

    /** Vacuum magnetic permeability, H/m: CODATA 2022 recommended value 1.25663706127(20)e-6. */
    public static final double VACUUM_PERMEABILITY_HENRY_PER_METRE = 1.25663706127e-6;

    /** Vacuum electric permittivity, F/m, derived as 1/(μ0 c²). */
    public static final double VACUUM_PERMITTIVITY_FARAD_PER_METRE =
            1.0 / (VACUUM_PERMEABILITY_HENRY_PER_METRE
                    * SPEED_OF_LIGHT_METRES_PER_SECOND * SPEED_OF_LIGHT_METRES_PER_SECOND);

    /** Wave impedance of free space η0 = μ0·c, Ω (about 376.730 Ω). */
    public static final double FREE_SPACE_IMPEDANCE_OHM =
            VACUUM_PERMEABILITY_HENRY_PER_METRE * SPEED_OF_LIGHT_METRES_PER_SECOND;

    /** Decibels per neper for field quantities: 20·log10(e). */
    public static final double DECIBELS_PER_NEPER = 20.0 / Math.log(10.0);

    /** Offset between the Celsius and the kelvin scale. */
    public static final double ZERO_CELSIUS_KELVIN = 273.15;

    private PhysicalConstants() {
    }
}
