package org.linesweep.bench;

import java.util.ArrayList;
import java.util.List;
import javafx.scene.chart.ValueAxis;

/** A minimal logarithmic axis for the stock LineChart baseline (the stock chart has none). */
final class LogAxis extends ValueAxis<Number> {

    LogAxis(double lower, double upper) {
        super(lower, upper);
        setAutoRanging(false);
        setAnimated(false);
    }

    @Override
    protected List<Number> calculateMinorTickMarks() {
        return List.of();
    }

    @Override
    protected void setRange(Object range, boolean animate) {
        double[] r = (double[]) range;
        setLowerBound(r[0]);
        setUpperBound(r[1]);
    }

    @Override
    protected Object getRange() {
        return new double[] {getLowerBound(), getUpperBound()};
    }

    @Override
    protected List<Number> calculateTickValues(double length, Object range) {
        double[] r = (double[]) range;
        List<Number> ticks = new ArrayList<>();
        for (int e = (int) Math.floor(Math.log10(r[0])); e <= Math.ceil(Math.log10(r[1])); e++) {
            double v = Math.pow(10, e);
            if (v >= r[0] && v <= r[1]) {
                ticks.add(v);
            }
        }
        return ticks;
    }

    @Override
    protected String getTickMarkLabel(Number value) {
        return String.format("%.0e", value.doubleValue());
    }

    @Override
    public double getDisplayPosition(Number value) {
        double lower = Math.log10(getLowerBound());
        double upper = Math.log10(getUpperBound());
        double fraction = (Math.log10(value.doubleValue()) - lower) / (upper - lower);
        return getSide().isVertical() ? (1 - fraction) * getHeight() : fraction * getWidth();
    }

    @Override
    public Number getValueForDisplay(double position) {
        double lower = Math.log10(getLowerBound());
        double upper = Math.log10(getUpperBound());
        double fraction = getSide().isVertical() ? 1 - position / getHeight() : position / getWidth();
        return Math.pow(10, lower + fraction * (upper - lower));
    }
}
