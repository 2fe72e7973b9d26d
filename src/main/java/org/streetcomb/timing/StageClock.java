package org.streetcomb.timing;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Supplier;

/**
 * Times the stages of a run and tells a listener when each starts and ends, so the command line can show
 * progress for slow stages and the summary can list the time per stage.
 */
public final class StageClock {

    /** @param seconds wall-clock time of the stage */
    public record Stage(String name, double seconds) {
    }

    /** Receives stage events; the command line decides whether to show them. */
    public interface Listener {
        void started(String stage);

        void finished(Stage stage);

        /** A progress line from inside a long stage (the proof search, say). */
        default void note(String message) {
        }
    }

    private final List<Stage> stages = new ArrayList<>();
    private final Listener listener;

    public StageClock(Listener listener) {
        this.listener = listener;
    }

    public <T> T time(String name, Supplier<T> work) {
        listener.started(name);
        long start = System.nanoTime();
        T result = work.get();
        Stage stage = new Stage(name, (System.nanoTime() - start) / 1e9);
        stages.add(stage);
        listener.finished(stage);
        return result;
    }

    public void run(String name, Runnable work) {
        time(name, () -> {
            work.run();
            return null;
        });
    }

    /** Passes a progress line to the listener. */
    public void note(String message) {
        listener.note(message);
    }

    public List<Stage> stages() {
        return List.copyOf(stages);
    }

    /** A listener that shows nothing. */
    public static final Listener SILENT = new Listener() {
        @Override
        public void started(String stage) {
        }

        @Override
        public void finished(Stage stage) {
        }
    };
}
