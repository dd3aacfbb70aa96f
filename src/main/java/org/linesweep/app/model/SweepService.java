package org.linesweep.app.model;

import java.util.concurrent.Executor;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicLong;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.Consumer;
import org.linesweep.design.Design;
import org.linesweep.design.SweepSettings;
import org.linesweep.sweep.SweepEngine;

/**
 * The seam between the FX thread and the computation: requests are computed on a worker executor, only the
 * latest pending request is ever computed (requests made while one is running replace each other), and
 * each finished snapshot is handed to the sink through the result executor (the FX thread in the app,
 * the calling thread in tests). A result older than one already delivered is never delivered.
 *
 * <p>The worker keeps one engine and the last grid's frequencies between requests: a drag re-sweeps the same
 * grid, so neither the grid nor the values the models derive from it are computed again.
 */
public final class SweepService {

    private final Executor worker;
    private final Executor resultExecutor;
    private final Consumer<SweepSnapshot> sink;
    private final Consumer<Throwable> errorSink;
    private final AtomicReference<Request> pending = new AtomicReference<>();
    private final AtomicBoolean draining = new AtomicBoolean();
    private final AtomicLong sequence = new AtomicLong();
    private final AtomicLong delivered = new AtomicLong(-1);

    /** The worker's engine and grid; only the draining thread touches it. */
    private final Workspace workerSpace = new Workspace();

    private record Request(long sequence, Design design) {
    }

    /** One thread's engine and the frequencies of the last grid it swept (a drag keeps the grid). */
    private static final class Workspace {
        private final SweepEngine engine = new SweepEngine();
        private SweepSettings settings;
        private double[] frequencies;

        SweepSnapshot compute(long sequence, Design design) {
            if (!design.sweep().equals(settings)) {
                settings = design.sweep();
                frequencies = settings.grid().frequencies();
            }
            return SweepSnapshot.compute(sequence, design, engine, frequencies);
        }
    }

    public SweepService(Executor worker, Executor resultExecutor, Consumer<SweepSnapshot> sink,
            Consumer<Throwable> errorSink) {
        this.worker = worker;
        this.resultExecutor = resultExecutor;
        this.sink = sink;
        this.errorSink = errorSink;
    }

    /** Asks for a design to be computed; returns its sequence number. */
    public long request(Design design) {
        long number = sequence.incrementAndGet();
        pending.set(new Request(number, design));
        if (draining.compareAndSet(false, true)) {
            worker.execute(this::drain);
        }
        return number;
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
