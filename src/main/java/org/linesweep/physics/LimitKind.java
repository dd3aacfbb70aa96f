package org.linesweep.physics;

/** Which limit sets a design's frequency ceiling. */
public enum LimitKind {
    /** The line stops being electrically short: L/λ reaches the threshold. */
    ELECTRICAL_LENGTH("electrical-length"),
    /** The first higher-order mode: the TEM or quasi-TEM model stops holding. */
    HIGHER_ORDER_MODE("higher-order-mode"),
    /** The total loss reaches the budget. */
    LOSS_BUDGET("loss-budget");

    private final String key;

    LimitKind(String key) {
        this.key = key;
    }

    /** The name used in the command line's output. */
    public String key() {
        return key;
    }
}
