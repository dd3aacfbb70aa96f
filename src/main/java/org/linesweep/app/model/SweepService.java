package org.linesweep.app.model;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.concurrent.Executor;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicLong;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.BooleanSupplier;
import java.util.function.Consumer;
import org.linesweep.design.Design;
import org.linesweep.design.SweepSettings;
import org.linesweep.physics.LineType;
import org.linesweep.sweep.SweepEngine;

/**
 * The seam between the FX thread and the computation: requests are computed on a worker executor, only the
 * latest pending request is ever computed (requests made while one is running replace each other), and
 * each finished snapshot is handed to the sink through the result executor (the FX thread in the app,
 * the calling thread in tests). A result older than one already delivered is never delivered.
 *
 * <p>A request made on the result thread may instead be computed right there, when the same kind of design
 * (line type and point count) last took no longer than the inline budget. A drag step is set during a pulse;
 * handed to the worker, its curves could only be drawn in the next pulse, a frame (16.7 ms) later, however
 * fast the sweep. Computed in place they are drawn in the pulse that made the change. A kind not yet
 * measured, or one that took longer, goes to the worker, so the window never waits on a heavy computation;
 * both threads time what they compute, so the choice follows the machine as it warms up. On a JVM that cannot
 * time a thread's CPU, everything goes to the worker.
 *
 * <p>Each thread keeps one engine and the last grid's frequencies between requests: a drag re-sweeps the same
 * grid, so neither the grid nor the values the models derive from it are computed again.
 */
public final class SweepService {

    /**
     * Costs are timed in the computing thread's CPU time: the worker shares two cores with the FX and render
     * threads, and its wall-clock time (2-7 ms for a 0.4 ms sweep, measured) says more about the scheduler than
     * about what the same work would cost the FX thread.
     */
    private static final ThreadMXBean CPU_CLOCK = ManagementFactory.getThreadMXBean();
    private static final boolean CPU_TIMED = CPU_CLOCK.isCurrentThreadCpuTimeSupported()
            && CPU_CLOCK.isThreadCpuTimeEnabled();

    /** Never compute on the result thread. */
    public static final long NEVER_INLINE = -1;

    private final Executor worker;
    private final Executor resultExecutor;
    private final Consumer<SweepSnapshot> sink;
    private final Consumer<Throwable> errorSink;
    private final BooleanSupplier onResultThread;
    private final long inlineBudgetNanos;
    private final AtomicReference<Request> pending = new AtomicReference<>();
    private final AtomicBoolean draining = new AtomicBoolean();
    private final AtomicLong sequence = new AtomicLong();
    private final AtomicLong delivered = new AtomicLong(-1);
    /** How long the last computation took, and of what kind of design; null before the first. */
    private final AtomicReference<Cost> lastCost = new AtomicReference<>();

    /** The worker's engine and grid; only the draining thread touches it. */
    private final Workspace workerSpace = new Workspace();
    /** The result thread's engine and grid, for requests computed in place. */
    private final Workspace inlineSpace = new Workspace();

    private record Request(long sequence, Design design) {
    }

    /** What a computation's time depends on, for the choice of thread; the values a drag changes are left out. */
    private record CostKind(LineType type, boolean pair, int points) {
        static CostKind of(Design design) {
            return new CostKind(design.geometry().type(), design.geometry().isPair(), design.sweep().points());
        }
    }

    private record Cost(CostKind kind, long nanos) {
    }

    /** One thread's engine and the frequencies of the last grid it swept (a drag keeps the grid). */
    private final class Workspace {
        private final SweepEngine engine = new SweepEngine();
        private SweepSettings settings;
        private double[] frequencies;

        SweepSnapshot compute(long sequence, Design design) {
            long start = CPU_CLOCK.getCurrentThreadCpuTime();
            if (!design.sweep().equals(settings)) {
                settings = design.sweep();
                frequencies = settings.grid().frequencies();
            }
            SweepSnapshot snapshot = SweepSnapshot.compute(sequence, design, engine, frequencies);
            lastCost.set(new Cost(CostKind.of(design), CPU_CLOCK.getCurrentThreadCpuTime() - start));
            return snapshot;
        }
    }

    /** A service that always computes on the worker. */
    public SweepService(Executor worker, Executor resultExecutor, Consumer<SweepSnapshot> sink,
            Consumer<Throwable> errorSink) {
        this(worker, resultExecutor, sink, errorSink, () -> false, NEVER_INLINE);
    }

    /**
     * @param worker where requests are computed
     * @param resultExecutor the thread results are delivered on
     * @param sink receives each newer result, on the result thread
     * @param errorSink receives a computation's failure, on the result thread
     * @param onResultThread whether the caller is on the result thread
     * @param inlineBudgetNanos the longest a computation may have taken to be repeated on the result thread;
     *        {@link #NEVER_INLINE} for never
     */
    public SweepService(Executor worker, Executor resultExecutor, Consumer<SweepSnapshot> sink,
            Consumer<Throwable> errorSink, BooleanSupplier onResultThread, long inlineBudgetNanos) {
        this.worker = worker;
        this.resultExecutor = resultExecutor;
        this.sink = sink;
        this.errorSink = errorSink;
        this.onResultThread = onResultThread;
        this.inlineBudgetNanos = inlineBudgetNanos;
    }

    /** Asks for a design to be computed; returns its sequence number. */
    public long request(Design design) {
        long number = sequence.incrementAndGet();
        if (cheapEnoughToComputeHere(design)) {
            pending.set(null); // a request still waiting for the worker is older: never compute it
            try {
                deliver(inlineSpace.compute(number, design));
            } catch (RuntimeException e) {
                errorSink.accept(e);
            }
            return number;
        }
        pending.set(new Request(number, design));
        if (draining.compareAndSet(false, true)) {
            worker.execute(this::drain);
        }
        return number;
    }

    private boolean cheapEnoughToComputeHere(Design design) {
        if (inlineBudgetNanos < 0 || !CPU_TIMED || !onResultThread.getAsBoolean()) {
            return false;
        }
        Cost last = lastCost.get();
        return last != null && last.nanos() <= inlineBudgetNanos && last.kind().equals(CostKind.of(design));
    }

    private void drain() {
        while (true) {
            Request request = pending.getAndSet(null);
            if (request == null) {
                draining.set(false);
                // a request may have arrived between the read and the reset
                if (pending.get() != null && draining.compareAndSet(false, true)) {
                    continue;
                }
                return;
            }
            try {
                SweepSnapshot snapshot = workerSpace.compute(request.sequence(), request.design());
                resultExecutor.execute(() -> deliver(snapshot));
            } catch (RuntimeException e) {
                resultExecutor.execute(() -> errorSink.accept(e));
            }
        }
    }

    private void deliver(SweepSnapshot snapshot) {
        if (snapshot.sequence() > delivered.get()) {
            delivered.set(snapshot.sequence());
            sink.accept(snapshot);
        }
    }

    /** Sequence number of the newest request. */
    public long latestRequest() {
        return sequence.get();
    }
}
