package org.linesweep.app.view;

import javafx.scene.paint.Color;

/**
 * Colours and dash patterns. Every pinned design differs from the live one in colour and in dash pattern,
 * never in colour alone. Meeting mode uses the Okabe-Ito colour-blind-safe palette (Okabe and Ito, 2002).
 */
public record Palette(Color live, Color[] pins, Color electricalLength, Color skin, Color higherMode, Color lossBudget,
        Color lumpedShade, Color invalidHatch, Color regionBand, Color ink, Color grid, Color paper) {

    /** Dash patterns of the four pin slots (the live design is solid). */
    public static final double[][] PIN_DASHES = {{10, 5}, {2, 4}, {14, 4, 3, 4}, {6, 3, 1.5, 3}};

    /** The everyday palette. */
    public static final Palette STANDARD = new Palette(Color.web("#17408b"),
            new Color[] {Color.web("#c2410c"), Color.web("#2f7d32"), Color.web("#8e24aa"), Color.web("#a1172f")},
            Color.web("#00796b"), Color.web("#8d6e00"), Color.web("#c62828"), Color.web("#5e35b1"),
            Color.web("#2e7d32", 0.09), Color.web("#c62828", 0.55), Color.web("#b08800", 0.10),
            Color.web("#1f2328"), Color.web("#dde2e8"), Color.WHITE);

    /** Meeting mode: Okabe-Ito colours, black ink, stronger grid. */
    public static final Palette MEETING = new Palette(Color.web("#0072B2"),
            new Color[] {Color.web("#E69F00"), Color.web("#009E73"), Color.web("#CC79A7"), Color.web("#D55E00")},
            Color.web("#009E73"), Color.web("#999999").darker(), Color.web("#D55E00"), Color.web("#56B4E9").darker(),
            Color.web("#009E73", 0.10), Color.web("#D55E00", 0.6), Color.web("#F0E442", 0.22),
            Color.BLACK, Color.web("#b8bec6"), Color.WHITE);

    /** The palette of meeting mode or of the ordinary window. */
    public static Palette of(boolean meeting) {
        return meeting ? MEETING : STANDARD;
    }

    public Color pin(int slot) {
        return pins[slot % pins.length];
    }
}
