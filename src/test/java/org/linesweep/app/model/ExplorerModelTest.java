package org.linesweep.app.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Executor;
import java.util.function.BooleanSupplier;
import org.junit.jupiter.api.Test;
import org.linesweep.design.Design;
import org.linesweep.design.SweepSettings;
import org.linesweep.io.Presets;
import org.linesweep.physics.LimitFinder;
import org.linesweep.sweep.GridScale;

/** The observable model without the toolkit: changes, undo, drags, rejections, pins, the threading seam. */
class ExplorerModelTest {

    private static final Executor NOW = Runnable::run;

    private static ExplorerModel model() {
        return new ExplorerModel(Presets.load("bench-patch-lead"), NOW, NOW);
    }

    @Test
    void computesTheOpeningDesign() {
        ExplorerModel m = model();
        assertNotNull(m.snapshotProperty().get());
        assertEquals(m.getDesign(), m.snapshotProperty().get().design());
        Design d = m.getDesign();
        assertEquals(LimitFinder.find(d.toModel(), d.lengthMetres(), d.threshold(), d.lossBudgetDb()),
                m.snapshotProperty().get().limits());
    }

    @Test
    void changesAreUndoableAndRedoable() {
        ExplorerModel m = model();
        Design original = m.getDesign();
        assertTrue(m.apply(d -> d.withGeometryValue("outerDiameter", 3.5e-3)));
        assertEquals(3.5e-3, m.getDesign().geometry().value("outerDiameter"));
        assertTrue(m.canUndoProperty().get());
        assertTrue(m.undo());
        assertEquals(original, m.getDesign());
        assertEquals(original, m.snapshotProperty().get().design(), "the snapshot follows the undo");
        assertTrue(m.redo());
        assertEquals(3.5e-3, m.getDesign().geometry().value("outerDiameter"));
        assertFalse(m.redo());
    }

    @Test
    void aDragIsOneUndoStep() {
        ExplorerModel m = model();
        Design original = m.getDesign();
        m.beginDrag();
        for (int i = 1; i <= 20; i++) {
            double value = 3e-3 + i * 0.05e-3;
            assertTrue(m.drag(d -> d.withGeometryValue("outerDiameter", value)));
        }
        m.endDrag();
        assertEquals(4e-3, m.getDesign().geometry().value("outerDiameter"), 1e-12);
        assertTrue(m.undo());
        assertEquals(original, m.getDesign());
        assertFalse(m.canUndoProperty().get());
    }

    @Test
    void aRefusedChangeKeepsTheLastValidDesignAndSaysWhy() {
        ExplorerModel m = model();
        Design original = m.getDesign();
        assertFalse(m.apply(d -> d.withGeometryValue("innerDiameter", 5e-3)));
        assertEquals(original, m.getDesign());
        assertTrue(m.messageProperty().get().startsWith("line.innerDiameter"), m.messageProperty().get());
        assertFalse(m.canUndoProperty().get());
        assertTrue(m.apply(d -> d.withGeometryValue("innerDiameter", 1e-3)));
        assertEquals("", m.messageProperty().get());
    }

    @Test
    void widerCoaxGapRaisesImpedance() {
        ExplorerModel m = model();
        double before = m.snapshotProperty().get().sweep().z0MagnitudeOhm(200);
        m.apply(d -> d.withGeometryValue("outerDiameter", 4e-3));
        assertTrue(m.snapshotProperty().get().sweep().z0MagnitudeOhm(200) > before);
    }

    @Test
    void atMostFourPins() {
        ExplorerModel m = model();
        for (int i = 0; i < 4; i++) {
            double value = 3e-3 + i * 0.2e-3;
            m.apply(d -> d.withGeometryValue("outerDiameter", value));
            assertTrue(m.pinCurrent());
        }
        assertFalse(m.pinCurrent());
        assertEquals(4, m.pins().size());
        assertEquals(List.of(0, 1, 2, 3), m.pins().stream().map(Pin::slot).toList());
        m.unpin(m.pins().get(1));
        assertTrue(m.pinCurrent());
        assertEquals(1, m.pins().get(3).slot(), "a freed slot is reused, so styles stay distinct");
    }

    /** Only the latest request is computed, and an older result never replaces a newer one. */
    @Test
    void serviceComputesOnlyTheLatestRequest() {
        List<Runnable> queued = new ArrayList<>();
        List<SweepSnapshot> delivered = new ArrayList<>();
        SweepService service = new SweepService(queued::add, NOW, delivered::add, e -> { });
        Design base = Presets.load("bench-patch-lead");
        for (int i = 0; i < 10; i++) {
            service.request(base.withLength(1 + i));
        }
        assertEquals(1, queued.size(), "one worker job drains all requests");
        queued.get(0).run();
        assertEquals(1, delivered.size(), "nine superseded requests were never computed");
        assertEquals(10.0, delivered.get(0).design().lengthMetres());
    }

    @Test
    void staleResultsAreDropped() {
        List<Runnable> results = new ArrayList<>();
        List<SweepSnapshot> delivered = new ArrayList<>();
        List<Runnable> jobs = new ArrayList<>();
        SweepService service = new SweepService(jobs::add, results::add, delivered::add, e -> { });
        Design base = Presets.load("bench-patch-lead");
        service.request(base.withLength(1));
        jobs.remove(0).run();
        service.request(base.withLength(2));
        jobs.remove(0).run();
        results.get(1).run();
        results.get(0).run();
        assertEquals(1, delivered.size());
        assertEquals(2.0, delivered.get(0).design().lengthMetres());
    }

    /**
     * On the result thread, a design of a kind already computed within the budget is computed in place and
     * delivered before the request returns (drawn in the same frame); a kind not yet measured goes to the worker.
     */
    @Test
    void cheapChangesOnTheResultThreadAreComputedInPlace() {
        List<Runnable> jobs = new ArrayList<>();
        List<SweepSnapshot> delivered = new ArrayList<>();
        SweepService service = new SweepService(jobs::add, NOW, delivered::add, e -> { }, () -> true,
                Long.MAX_VALUE);
        Design base = Presets.load("bench-patch-lead");
        service.request(base);
        assertEquals(1, jobs.size(), "the first design of its kind has no measured cost: the worker computes it");
        assertTrue(delivered.isEmpty());
        jobs.remove(0).run();
        assertEquals(1, delivered.size());

        Design wider = base.withGeometryValue("outerDiameter", 3.2e-3);
        service.request(wider);
        assertTrue(jobs.isEmpty(), "no worker job for a change computed in place");
        assertEquals(List.of(base, wider), delivered.stream().map(SweepSnapshot::design).toList());

        Design finer = wider.withSweep(new SweepSettings(1e4, 2e10, 3000, GridScale.LOG));
        service.request(finer);
        assertEquals(1, jobs.size(), "another point count is another kind of cost: to the worker");
        Design longer = wider.withLength(2.0);
        service.request(longer);
        assertEquals(longer, delivered.get(2).design(), "the measured kind is computed in place again");
        jobs.remove(0).run();
        assertEquals(3, delivered.size(), "the superseded worker request is neither computed nor delivered");
    }

    /** Off the result thread, with no budget, or after a computation over the budget, the worker computes. */
    @Test
    void otherwiseTheWorkerComputes() {
        assertTrue(secondRequestGoesToTheWorker(() -> false, Long.MAX_VALUE), "off the result thread");
        assertTrue(secondRequestGoesToTheWorker(() -> true, SweepService.NEVER_INLINE), "no budget");
        assertTrue(secondRequestGoesToTheWorker(() -> true, 0), "over the budget");
        assertFalse(secondRequestGoesToTheWorker(() -> true, Long.MAX_VALUE), "the control case");
    }

    private static boolean secondRequestGoesToTheWorker(BooleanSupplier onResultThread, long budgetNanos) {
        List<Runnable> jobs = new ArrayList<>();
        SweepService service = new SweepService(jobs::add, NOW, s -> { }, e -> { }, onResultThread, budgetNanos);
        Design base = Presets.load("bench-patch-lead");
        service.request(base);
        jobs.remove(0).run();
        service.request(base.withLength(2.0));
        return !jobs.isEmpty();
    }
}
