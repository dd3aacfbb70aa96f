package org.linesweep.app.view;

import java.util.function.DoubleFunction;
import javafx.geometry.Insets;
import javafx.scene.control.Label;
import javafx.scene.control.Slider;
import javafx.scene.control.TextField;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.linesweep.design.InvalidInputException;
import org.linesweep.design.Rule;

/**
 * One numeric input: a label, a text field that accepts units and shows the value in the chosen units, an
 * optional slider (logarithmic over the range it is given), and an inline message under it when input is
 * refused. The control keeps no value of its own: it shows what it is told and reports what the user does.
 */
public final class QuantityControl extends VBox {

    /** What the control reports. */
    public interface Listener {
        /** A slider drag starts. */
        void dragStarted();

        /** A step of a drag or a slider click: the new value in SI units; false if the design refused it. */
        boolean dragged(double value);

        /** The drag ends. */
        void dragEnded();

        /** A value typed and committed; false if the design refused it. */
        boolean committed(double value);
    }

    private static final double SLIDER_STEPS = 1000;

    private final Rule rule;
    private final String field;
    private final TextField text = new TextField();
    private final Slider slider;
    private final Label message = new Label();
    private DoubleFunction<String> formatter;
    private double shownValue = Double.NaN;
    /** The text last written for {@link #shownValue}; null when it must be written again. */
    private String shownText;
    private double sliderMin;
    private double sliderMax;
    private boolean updating;
    private final Listener listener;

    /**
     * @param label what the user reads
     * @param field the field's name in messages (its design-file path)
     * @param rule what values are allowed
     * @param withSlider true for a slider under the field
     * @param formatter writes a value in the chosen units
     */
    public QuantityControl(String label, String field, Rule rule, boolean withSlider, DoubleFunction<String> formatter,
            Listener listener) {
        this.rule = rule;
        this.field = field;
        this.formatter = formatter;
        this.listener = listener;
        Label name = new Label(label);
        name.getStyleClass().add("quantity-label");
        text.setId(field.replace('.', '-'));
        text.setPrefColumnCount(7);
        text.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        name.setMinWidth(40);
        text.setTooltip(new Tooltip(rule.allowed() + ". Accepts units, e.g. " + rule.kind().example() + "."));
        text.setOnAction(e -> commitText());
        text.focusedProperty().addListener((o, was, is) -> {
            if (!is) {
                commitText();
            }
        });
        message.getStyleClass().add("quantity-message");
        message.setWrapText(true);
        message.setManaged(false);
        message.setVisible(false);
        GridPane row = new GridPane();
        row.setHgap(8);
        row.add(name, 0, 0);
        row.add(text, 1, 0);
        GridPane.setHgrow(name, Priority.ALWAYS);
        name.setMaxWidth(Double.MAX_VALUE);
        getChildren().add(row);
        if (withSlider) {
            slider = new Slider(0, SLIDER_STEPS, SLIDER_STEPS / 2);
            slider.setId(field.replace('.', '-') + "-slider");
            slider.valueChangingProperty().addListener((o, was, is) -> {
                if (is) {
                    listener.dragStarted();
                } else {
                    listener.dragEnded();
                }
            });
            slider.valueProperty().addListener((o, old, now) -> {
                if (updating) {
                    return;
                }
                double value = valueOfSlider(now.doubleValue());
                if (!rule.test(value)) {
                    return;
                }
                boolean dragging = slider.isValueChanging();
                if (!dragging) {
                    listener.dragStarted();
                }
                boolean accepted = listener.dragged(value);
                if (!dragging) {
                    listener.dragEnded();
                }
                if (!accepted) {
                    showMessage(true);
                }
            });
            getChildren().add(slider);
        } else {
            slider = null;
        }
        getChildren().add(message);
        setSpacing(2);
        setPadding(new Insets(2, 0, 4, 0));
    }

    /** Puts an action (a small button) beside the field. */
    public void addAction(javafx.scene.Node action) {
        GridPane row = (GridPane) getChildren().get(0);
        row.add(action, 2, 0);
    }

    /** Shows a value; re-centres the slider's range on it unless a drag is under way. */
    public void show(double value) {
        // a design change re-shows every control; most did not change, and formatting is the costly part
        if (value == shownValue && shownText != null && shownText.equals(text.getText())
                && (slider == null || !slider.isValueChanging())) {
            return;
        }
        shownValue = value;
        updating = true;
        try {
            String shown = formatter.apply(value);
            shownText = shown;
            if (!text.getText().equals(shown)) {
                text.setText(shown);
            }
            if (slider != null) {
                if (!slider.isValueChanging() && !(value >= sliderMin && value <= sliderMax && sliderMin > 0)) {
                    recentre(value);
                }
                if (!slider.isValueChanging()) {
                    slider.setValue(sliderOf(value));
                }
            }
        } finally {
            updating = false;
        }
    }

    /** Re-centres the slider's range on a value: one decade each way, inside the rule's range. */
    public void recentre(double value) {
        double low = Math.max(value / 10, rule.minimum() > 0 ? rule.minimum() : value / 10);
        double high = Math.min(value * 10, rule.maximum());
        sliderMin = low;
        sliderMax = high;
    }

    /** Changes how values are written (metric or imperial) and re-shows the current one. */
    public void setFormatter(DoubleFunction<String> formatter) {
        this.formatter = formatter;
        this.shownText = null;
        if (!Double.isNaN(shownValue)) {
            show(shownValue);
        }
    }

    /** Shows a refusal message under the field, or clears it. */
    public void setMessage(String text) {
        message.setText(text == null ? "" : text);
        showMessage(text != null && !text.isEmpty());
    }

    private void showMessage(boolean visible) {
        message.setVisible(visible);
        message.setManaged(visible);
    }

    private void commitText() {
        if (updating) {
            return;
        }
        String typed = text.getText();
        if (!Double.isNaN(shownValue) && typed.equals(formatter.apply(shownValue))) {
            return;
        }
        double value;
        try {
            value = rule.parse(field, typed);
        } catch (InvalidInputException e) {
            setMessage(e.getMessage() + ". Kept " + formatter.apply(shownValue) + ".");
            revert();
            return;
        }
        if (listener.committed(value)) {
            setMessage("");
            if (slider != null) {
                recentre(value);
            }
        } else {
            showMessage(true);
            revert();
        }
    }

    private void revert() {
        if (!Double.isNaN(shownValue)) {
            updating = true;
            text.setText(formatter.apply(shownValue));
            updating = false;
        }
    }

    private double valueOfSlider(double position) {
        return sliderMin * Math.pow(sliderMax / sliderMin, position / SLIDER_STEPS);
    }

    private double sliderOf(double value) {
        return SLIDER_STEPS * Math.log(value / sliderMin) / Math.log(sliderMax / sliderMin);
    }

    public TextField textField() {
        return text;
    }

    public Slider slider() {
        return slider;
    }

    public Label messageLabel() {
        return message;
    }

}
