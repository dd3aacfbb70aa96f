package org.linesweep.app.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Executor;
import org.junit.jupiter.api.Test;
import org.linesweep.design.Design;
import org.linesweep.io.Presets;
import org.linesweep.physics.LimitFinder;

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
}
