package org.linesweep.bench;

import com.sun.javafx.tk.RenderJob;
import com.sun.javafx.tk.Toolkit;
import java.lang.management.CompilationMXBean;
import java.lang.management.ManagementFactory;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.prefs.Preferences;
import javafx.animation.AnimationTimer;
import javafx.application.Application;
import javafx.application.Platform;
import javafx.scene.Parent;
import javafx.scene.Scene;
import javafx.scene.chart.LineChart;
import javafx.scene.chart.NumberAxis;
import javafx.scene.chart.XYChart;
import javafx.scene.control.Slider;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.GridPane;
import javafx.stage.Stage;
import org.linesweep.app.ExplorerLauncher;
import org.linesweep.app.ExplorerWindow;
import org.linesweep.app.FileDialogs;
import org.linesweep.app.model.ExplorerModel;
import org.linesweep.app.model.SweepService;
import org.linesweep.app.model.SweepSnapshot;
import org.linesweep.app.view.FrequencyPlot;
import org.linesweep.design.Design;
import org.linesweep.design.SweepSettings;
import org.linesweep.io.Presets;
import org.linesweep.sweep.GridScale;
import org.linesweep.sweep.SweepResult;

/**
 * Measures how the explorer follows a drag. The real window opens on the bench patch lead with the given
 * number of points and marker mode on; an {@link AnimationTimer} moves the outer-diameter slider one step at
 * the start of each pulse (60 warm-up steps, then 300 measured), as a drag does.
 *
 * <p>For each step it records (a) the FX-thread time the update costs: the slider's change handling in the
 * pulse that sets it, the handling of the finished sweep when it arrives (a {@code runLater} from the sweep
 * thread) and the CSS and layout passes of the pulse that draws it (pre- to post-layout pulse listener);
 * (b) the time from setting the value to the end of the layout pass of the pulse that has drawn the result
 * of that step (or a newer one) on all four plots; and (c) the total latency, until that pulse's frame has
 * been painted and its pixels passed to the window system. For (c), a {@code runLater} posted from that
 * pulse runs as soon as the pulse ends, when the pulse's paint job is already queued on the render thread,
 * and queues a job behind it ({@code Toolkit.addRenderJob}, JavaFX's own internal hook: the render thread is
 * a single-thread queue, so the job runs when the frame has been painted). In the software pipeline the
 * painter then leaves the finished frame's pixels to the FX thread's event queue, which copies them to the
 * window; so the job posts a {@code runLater} behind that copy, and that reads the clock. The next step is
 * set in the next pulse, as a drag would, without waiting for the paint.
 *
 * <p>System properties: {@code harness.free=true} sets a new value at every pulse without waiting for the last
 * one to be drawn (a step counts as shown with the first frame that shows it or a newer value; no FX time is
 * taken); {@code harness.inline=false} makes the model send every step to the worker thread; {@code
 * harness.totals=true} prints every step's figures; {@code harness.warmup=N} sets the warm-up steps (60 by
 * default, as specified); {@code harness.debug} prints each step's bookkeeping and the scene's node counts.
 *
 * <p>Mode {@code baseline} draws the same four quantities with the stock {@code LineChart} on a log
 * {@code ValueAxis}, animation and symbols off, fed the same snapshots.
 *
 * <p>Arguments: mode (explorer|baseline), points. Prints
 * {@code LATENCY mode=… points=… fx_p50_ms=… layout_p50_ms=… paint_p50_ms=… total_p50_ms=… total_p95_ms=…
 * heap_mb=… final_on_screen=… jit_ms=…}; paint is from the end of the pulse that drew a step to the end of its
 * frame's paint (the render thread's work for the frame, plus any wait for the frame before it); jit_ms is the
 * time the JIT compilers spent during the measured steps, summed over their threads.
 */
public final class LatencyHarness extends Application {

    /** Steps before the measured ones: 60 as specified; {@code -Dharness.warmup=N} to study a warmer JVM. */
    private static final int WARM_UP = Integer.getInteger("harness.warmup", 60);
    private static final int MEASURED = 300;

    private final List<Double> fxTimes = new ArrayList<>();
    private final List<Double> layoutTimes = new ArrayList<>();
    private final List<Double> totalTimes = new ArrayList<>();
    /** From the end of the pulse that drew a step to the end of its frame's paint on the render thread. */
    private final List<Double> paintTimes = new ArrayList<>();
    /** Measured steps whose frame the render thread has not reported painted yet. */
    private int paintsPending;
    private ExplorerModel model;
    private List<FrequencyPlot> plots;
    private int[] drawCounts;
    private int step;
    private long stepStart;
    private double stepOuterDiameter;
    private double fxThisStep;
    private boolean waiting;
    private long pulseLayoutStart;
    private boolean baseline;
    private List<LineChart<Number, Number>> charts;
    private long lastBaselineShown = -1;
    private ExecutorService worker;
    /** -Dharness.free=true: a new value at every pulse without waiting for the last to be drawn. */
    private final boolean free = Boolean.getBoolean("harness.free");
    private final List<OpenStep> openSteps = new ArrayList<>();
    /** The JIT compilers' accumulated time when the measured steps began, ms (-1 before). */
    private long compilingAtStart = -1;

    public static void main(String[] args) {
        ExplorerLauncher.configureRendering(); // the explorer's own rendering settings, for both modes
        launch(LatencyHarness.class, args);
    }

    @Override
    public void start(Stage stage) {
        List<String> args = getParameters().getRaw();
        baseline = args.size() > 0 && args.get(0).equals("baseline");
        int points = args.size() > 1 ? Integer.parseInt(args.get(1)) : 2000;
        Design design = Presets.load("bench-patch-lead");
        design = design.withSweep(new SweepSettings(design.sweep().fromHz(), design.sweep().toHz(), points,
                GridScale.LOG));
        worker = Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "sweep");
            t.setDaemon(true);
            return t;
        });
        model = new ExplorerModel(design, worker, runnable -> Platform.runLater(() -> {
            long t0 = System.nanoTime();
            runnable.run();
            if (waiting) {
                fxThisStep += (System.nanoTime() - t0) / 1e6;
            }
        }), Platform::isFxApplicationThread,
                Boolean.parseBoolean(System.getProperty("harness.inline", "true"))
                        ? ExplorerModel.INLINE_BUDGET_NANOS : SweepService.NEVER_INLINE);
        ExplorerWindow window = new ExplorerWindow(model, new NoDialogs(),
                Preferences.userRoot().node("org/linesweep/bench-latency"));
        Parent root = window.root();
        if (baseline) {
            root = stockCharts(window);
        }
        Scene scene = new Scene(root, 1400, 900);
        plots = window.plots().plots();
        scene.addPreLayoutPulseListener(() -> pulseLayoutStart = System.nanoTime());
        scene.addPostLayoutPulseListener(this::afterLayout);
        stage.setScene(scene);
        stage.show();
        Slider slider = window.designPanel().geometryControl("outerDiameter").slider();
        new AnimationTimer() {
            private int idle;

            @Override
            public void handle(long now) {
                if (waiting && !free) {
                    return;
                }
                if (step == 0 && idle++ < 30) {
                    return; // let the first frame settle
                }
                if (step >= WARM_UP + MEASURED) {
                    stop();
                    finish(points, slider);
                    return;
                }
                if (step == WARM_UP && compilingAtStart < 0) {
                    compilingAtStart = compilationMillis();
                }
                slider.setValueChanging(true);
                long t0 = System.nanoTime();
                double before = model.getDesign().geometry().value("outerDiameter");
                slider.setValue(slidePosition(step));
                if (free) {
                    openStep(before, t0);
                    return;
                }
                stepStart = t0;
                stepOuterDiameter = model.getDesign().geometry().value("outerDiameter");
                if (stepOuterDiameter == before) {
                    step++; // the slider landed on the same value: nothing to show
                    return;
                }
                fxThisStep = (System.nanoTime() - t0) / 1e6;
                drawCounts = plots.stream().mapToInt(FrequencyPlot::drawCount).toArray();
                waiting = true;
            }
        }.start();
    }

    /**
     * Free-running drag: the value just set (at {@code start}) waits to be shown, while the next one is set at the
     * next pulse anyway.
     */
    private void openStep(double outerDiameterBefore, long start) {
        Design stepDesign = model.getDesign();
        if (stepDesign.geometry().value("outerDiameter") != outerDiameterBefore && step >= WARM_UP) {
            openSteps.add(new OpenStep(stepDesign, start));
        }
        step++;
    }

    /** The slider's position at a step: back and forth over a quarter of its range. */
    private static double slidePosition(int step) {
        return 500 + 250 * Math.sin(step * 0.05 + 0.3);
    }

    /** A free-running step not yet on screen: its design and when it was set. */
    private record OpenStep(Design design, long start) {
    }

    /** In free-running mode: every open step up to the one now shown counts as shown (a newer value is). */
    private void afterFreeLayout(long end) {
        SweepSnapshot shown = model.snapshotProperty().get();
        if (shown == null) {
            return;
        }
        int index = -1;
        for (int i = 0; i < openSteps.size(); i++) {
            if (openSteps.get(i).design().equals(shown.design())) {
                index = i;
            }
        }
        for (int i = 0; i <= index; i++) {
            OpenStep done = openSteps.remove(0);
            layoutTimes.add((end - done.start()) / 1e6);
            timePaint(done.start());
        }
    }

    private void afterLayout() {
        long end = System.nanoTime();
        if (free) {
            afterFreeLayout(end);
            return;
        }
        if (!waiting) {
            return;
        }
        fxThisStep += (end - pulseLayoutStart) / 1e6;
        SweepSnapshot shown = model.snapshotProperty().get();
        boolean current = shown != null && shown.design().geometry().value("outerDiameter") == stepOuterDiameter;
        boolean drawn = baseline ? lastBaselineShown == (shown == null ? -2 : shown.sequence())
                : allRedrawn();
        if (System.getProperty("harness.debug") != null) {
            System.err.println("step " + step + " current " + current + " drawn " + drawn + " shown "
                    + (shown == null ? null : shown.design().geometry().value("outerDiameter")) + " want "
                    + stepOuterDiameter + " counts " + Arrays.toString(drawCounts) + " now "
                    + plots.stream().map(p -> p.drawCount()).toList());
        }
        if (current && drawn) {
            if (step >= WARM_UP) {
                fxTimes.add(fxThisStep);
                layoutTimes.add((end - stepStart) / 1e6);
                timePaint(stepStart);
            }
            step++;
            waiting = false;
        }
    }

    /** Records when the frame of the pulse now ending is on its way to the screen (see the class comment). */
    private void timePaint(long start) {
        paintsPending++;
        Platform.runLater(() -> {
            long pulseEnd = System.nanoTime();
            Toolkit.getToolkit().addRenderJob(new RenderJob(() -> {
                long painted = System.nanoTime();
                Platform.runLater(() -> {
                    paintTimes.add((painted - pulseEnd) / 1e6);
                    totalTimes.add((System.nanoTime() - start) / 1e6);
                    paintsPending--;
                });
            }));
        });
    }

    private boolean allRedrawn() {
        for (int i = 0; i < plots.size(); i++) {
            if (plots.get(i).drawCount() == drawCounts[i]) {
                return false;
            }
        }
        return true;
    }

    private void finish(int points, Slider slider) {
        if (paintsPending > 0) {
            Platform.runLater(() -> finish(points, slider)); // the last frames are still being painted
            return;
        }
        slider.setValueChanging(false);
        SweepSnapshot shown = model.snapshotProperty().get();
        boolean finalShown = shown != null && shown.design().equals(model.getDesign());
        System.gc();
        double heapMb = (ManagementFactory.getMemoryMXBean().getHeapMemoryUsage().getUsed()) / 1048576.0;
        System.out.printf(Locale.ROOT,
                "LATENCY mode=%s points=%d plots=4 steps=%d fx_p50_ms=%.2f fx_p95_ms=%.2f layout_p50_ms=%.2f"
                        + " layout_p95_ms=%.2f paint_p50_ms=%.2f total_p50_ms=%.2f total_p95_ms=%.2f"
                        + " heap_after_gc_mb=%.1f max_heap_mb=%.0f final_on_screen=%s jit_ms=%d%n",
                (baseline ? "baseline" : "explorer") + (free ? "-free" : ""), points,
                free ? totalTimes.size() : fxTimes.size(), percentile(fxTimes, 50),
                percentile(fxTimes, 95), percentile(layoutTimes, 50), percentile(layoutTimes, 95),
                percentile(paintTimes, 50), percentile(totalTimes, 50), percentile(totalTimes, 95), heapMb,
                Runtime.getRuntime().maxMemory() / 1048576.0, finalShown, compilationMillis() - compilingAtStart);
        if (Boolean.getBoolean("harness.totals")) {
            System.out.println("TOTALS " + inTenths(totalTimes));
            System.out.println("FX " + inTenths(fxTimes));
        }
        if (System.getProperty("harness.debug") != null) {
            countNodes(slider.getScene().getRoot(), 0);
        }
        worker.shutdownNow();
        Platform.exit();
    }

    /**
     * Time the JIT compilers have spent so far, summed over their threads, ms (0 where the JVM does not say). On two
     * cores their work during the measured steps competes with the FX and render threads.
     */
    private static long compilationMillis() {
        CompilationMXBean compiler = ManagementFactory.getCompilationMXBean();
        return compiler != null && compiler.isCompilationTimeMonitoringSupported()
                ? compiler.getTotalCompilationTime() : 0;
    }

    /** With -Dharness.debug: prints the scene's containers of more than 40 nodes (every pulse visits them all). */
    private static int countNodes(javafx.scene.Node node, int depth) {
        int n = 1;
        if (node instanceof Parent parent) {
            for (javafx.scene.Node child : parent.getChildrenUnmodifiable()) {
                n += countNodes(child, depth + 1);
            }
        }
        if (depth <= 6 && n > 40) {
            System.out.println("NODES " + "  ".repeat(depth) + node.getClass().getSimpleName() + " "
                    + node.getStyleClass() + " visible=" + node.isVisible() + " " + n);
        }
        return n;
    }

    private static List<String> inTenths(List<Double> millis) {
        return millis.stream().map(t -> String.format(Locale.ROOT, "%.1f", t)).toList();
    }

    private static double percentile(List<Double> values, double p) {
        double[] sorted = values.stream().mapToDouble(Double::doubleValue).toArray();
        Arrays.sort(sorted);
        if (sorted.length == 0) {
            return Double.NaN;
        }
        int index = (int) Math.ceil(p / 100 * sorted.length) - 1;
        return sorted[Math.max(0, Math.min(sorted.length - 1, index))];
    }

    /** The window with the plots replaced by four stock line charts fed the same snapshots. */
    private Parent stockCharts(ExplorerWindow window) {
        charts = new ArrayList<>();
        GridPane grid = new GridPane();
        String[] titles = {"attenuation dB/m", "phase velocity m/s", "|Z0| ohm", "R' ohm/m"};
        for (int i = 0; i < 4; i++) {
            NumberAxis y = new NumberAxis();
            y.setAnimated(false);
            y.setForceZeroInRange(false);
            LineChart<Number, Number> chart = new LineChart<>(new LogAxis(1e4, 2e10), y);
            chart.setAnimated(false);
            chart.setCreateSymbols(false);
            chart.setLegendVisible(false);
            chart.setTitle(titles[i]);
            chart.getData().add(new XYChart.Series<>());
            chart.setPrefSize(560, 330);
            grid.add(chart, i % 2, i / 2);
            charts.add(chart);
        }
        model.snapshotProperty().addListener((o, old, now) -> {
            SweepResult s = now.sweep();
            List<List<XYChart.Data<Number, Number>>> data = new ArrayList<>();
            for (int c = 0; c < 4; c++) {
                data.add(new ArrayList<>(s.size()));
            }
            for (int i = 0; i < s.size(); i++) {
                double f = s.frequencyHz(i);
                data.get(0).add(new XYChart.Data<>(f, s.alphaDbPerMetre(i)));
                data.get(1).add(new XYChart.Data<>(f, s.phaseVelocityMetresPerSecond(i)));
                data.get(2).add(new XYChart.Data<>(f, s.z0MagnitudeOhm(i)));
                data.get(3).add(new XYChart.Data<>(f, s.resistanceOhmPerMetre(i)));
            }
            for (int c = 0; c < 4; c++) {
                charts.get(c).getData().get(0).getData().setAll(data.get(c));
            }
            lastBaselineShown = now.sequence();
        });
        BorderPane pane = (BorderPane) window.root();
        BorderPane holder = new BorderPane(grid);
        holder.setLeft(pane.getLeft());
        pane.setLeft(null);
        return holder;
    }

    /** The harness opens and saves nothing. */
    private static final class NoDialogs implements FileDialogs {
        @Override
        public java.util.Optional<java.nio.file.Path> open(String title, String extension) {
            return java.util.Optional.empty();
        }

        @Override
        public java.util.Optional<java.nio.file.Path> save(String title, String extension, String suggestedName) {
            return java.util.Optional.empty();
        }
    }
}
