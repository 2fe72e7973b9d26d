package org.streetcomb;

import java.util.concurrent.atomic.AtomicLong;
import org.junit.platform.engine.TestExecutionResult;
import org.junit.platform.launcher.TestExecutionListener;
import org.junit.platform.launcher.TestIdentifier;
import org.junit.platform.launcher.TestPlan;

/**
 * Prints one line of test totals when the suite ends, so the quiet build ({@code mvn -B -q verify}, the
 * README's test command) still says how many tests ran; Maven's own summary is hidden by {@code -q}.
 * Registered through META-INF/services (the JUnit Platform's listener discovery).
 */
public final class TestTotals implements TestExecutionListener {

    private final AtomicLong passed = new AtomicLong();
    private final AtomicLong failed = new AtomicLong();
    private final AtomicLong skipped = new AtomicLong();
    private long started;

    @Override
    public void testPlanExecutionStarted(TestPlan plan) {
        started = System.nanoTime();
    }

    @Override
    public void executionSkipped(TestIdentifier test, String reason) {
        if (test.isTest()) {
            skipped.incrementAndGet();
        }
    }

    @Override
    public void executionFinished(TestIdentifier test, TestExecutionResult result) {
        if (test.isTest()) {
            (result.getStatus() == TestExecutionResult.Status.SUCCESSFUL ? passed : failed).incrementAndGet();
        }
    }

    @Override
    public void testPlanExecutionFinished(TestPlan plan) {
        if (passed.get() + failed.get() + skipped.get() == 0) {
            return;
        }
        System.out.printf("Tests: %d passed, %d failed, %d skipped in %.0f s%n", passed.get(), failed.get(),
                skipped.get(), (System.nanoTime() - started) / 1e9);
    }
}
