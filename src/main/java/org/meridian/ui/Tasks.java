package org.meridian.ui;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.function.Consumer;
import javax.swing.SwingUtilities;
import javax.swing.SwingWorker;
import javax.swing.Timer;

/**
 * Runs the window's long work off the event thread, in {@link SwingWorker}s, and tells the
 * status bar about it: anything that may take over ~50 ms (loading, map precomputation, the
 * span test, measures, exports) goes through here, so the window never freezes.
 *
 * <p>Each task has a key; submitting a task under a key cancels the one still running under it
 * (so scrubbing the window band recomputes once for the latest window, not once per step).
 * Tasks that end within {@value #QUIET_MS} ms never show a progress bar. Results are delivered
 * on the event thread; a cancelled task delivers nothing.
 */
public final class Tasks {
    /** A task shorter than this shows no progress bar. */
    static final int QUIET_MS = 200;

    /** The work of one task; runs on a worker thread. */
    @FunctionalInterface
    public interface Job<T> {
        T run(TaskProgress progress) throws Exception;
    }

    /** What a running job may report and must respect. */
    public interface TaskProgress extends org.meridian.io.StudyLoader.Progress {
        /** Reports nothing and is never cancelled: for work run outside the window (tests, benchmarks). */
        TaskProgress NONE = new TaskProgress() {
            @Override
            public void update(long done, long total) {
            }

            @Override
            public boolean cancelled() {
                return false;
            }
        };

        /** {@code done} of {@code total} units are finished. */
        void update(long done, long total);

        @Override
        default void update(int filesDone, int filesTotal) {
            update((long) filesDone, (long) filesTotal);
        }

        /** Whether the researcher pressed Cancel (or a newer task replaced this one). */
        @Override
        boolean cancelled();

        /** Throws {@link CancellationException} when cancelled; call between blocks of work. */
        default void checkCancelled() {
            if (cancelled()) {
                throw new CancellationException("cancelled");
            }
        }
    }

    /** Told when the set of running, visible tasks changes or one makes progress. */
    public interface Observer {
        /** {@code task} is null when nothing runs any more. */
        void showing(Task task);
    }

    /** A running task as the status bar sees it. */
    public final class Task {
        private final String key;
        private final String label;
        private final Worker<?> worker;
        private volatile long done;
        private volatile long total;
        private boolean visible;
        private boolean superseded;

        private Task(String key, String label, Worker<?> worker) {
            this.key = key;
            this.label = label;
            this.worker = worker;
        }

        public String label() {
            return label;
        }

        /** Progress from 0 to 1, or -1 while the amount of work is unknown. */
        public double fraction() {
            long t = total;
            return t > 0 ? Math.min(1, (double) done / t) : -1;
        }

        /** Asks the task to stop; it delivers nothing afterwards. */
        public void cancel() {
            worker.cancel(true);
        }

        public boolean isDone() {
            return worker.isDone();
        }
    }

    private final Map<String, Task> running = new HashMap<>();
    private final List<Task> order = new ArrayList<>();
    private final List<Observer> observers = new ArrayList<>();

    public void addObserver(Observer o) {
        observers.add(o);
    }

    /**
     * Starts a task; on the event thread. {@code onDone} receives the result, {@code onError} a
     * failure (never a cancellation). Returns the task, e.g. to cancel it.
     */
    public <T> Task submit(String key, String label, Job<T> job, Consumer<T> onDone,
            Consumer<Throwable> onError) {
        return submit(key, label, job, onDone, onError, () -> { });
    }

    /**
     * As {@link #submit(String, String, Job, Consumer, Consumer)}, and {@code onCancel} runs when
     * the task is cancelled (by Cancel, or by {@link #cancel}), though not when a newer task under
     * the same key replaces it.
     */
    public <T> Task submit(String key, String label, Job<T> job, Consumer<T> onDone,
            Consumer<Throwable> onError, Runnable onCancel) {
        if (!SwingUtilities.isEventDispatchThread()) {
            throw new IllegalStateException("tasks are submitted on the event thread");
        }
        Task previous = running.get(key);
        if (previous != null) {
            previous.superseded = true;
            previous.cancel();
            forget(previous);
        }
        Worker<T> worker = new Worker<>(job, onDone, onError, onCancel);
        Task task = new Task(key, label, worker);
        worker.task = task;
        running.put(key, task);
        order.add(task);
        Timer reveal = new Timer(QUIET_MS, e -> {
            if (!task.isDone() && running.get(key) == task) {
                task.visible = true;
                announce();
            }
        });
        reveal.setRepeats(false);
        reveal.start();
        worker.execute();
        return task;
    }

    /** Cancels the task running under a key, if any. */
    public void cancel(String key) {
        Task t = running.get(key);
        if (t != null) {
            t.cancel();
        }
    }

    /** Whether any task runs under this key. */
    public boolean isRunning(String key) {
        return running.containsKey(key);
    }

    /** The task shown in the status bar: the latest visible one still running, or null. */
    public Task shown() {
        for (int i = order.size() - 1; i >= 0; i--) {
            if (order.get(i).visible) {
                return order.get(i);
            }
        }
        return null;
    }

    private void forget(Task t) {
        if (running.get(t.key) == t) {
            running.remove(t.key);
        }
        order.remove(t);
        announce();
    }

    private void announce() {
        Task t = shown();
        for (Observer o : observers) {
            o.showing(t);
        }
    }

    private final class Worker<T> extends SwingWorker<T, Void> implements TaskProgress {
        private final Job<T> job;
        private final Consumer<T> onDone;
        private final Consumer<Throwable> onError;
        private final Runnable onCancel;
        private Task task;

        Worker(Job<T> job, Consumer<T> onDone, Consumer<Throwable> onError, Runnable onCancel) {
            this.job = job;
            this.onDone = onDone;
            this.onError = onError;
            this.onCancel = onCancel;
        }

        @Override
        protected T doInBackground() throws Exception {
            return job.run(this);
        }

        @Override
        public void update(long done, long total) {
            task.done = done;
            task.total = total;
            if (task.visible) {
                SwingUtilities.invokeLater(Tasks.this::announce);
            }
        }

        @Override
        public boolean cancelled() {
            return isCancelled() || Thread.currentThread().isInterrupted();
        }

        @Override
        protected void done() {
            forget(task);
            if (isCancelled()) {
                if (!task.superseded) {
                    onCancel.run();
                }
                return;
            }
            try {
                onDone.accept(get());
            } catch (ExecutionException e) {
                Throwable cause = e.getCause();
                if (cause instanceof CancellationException) {
                    if (!task.superseded) {
                        onCancel.run();
                    }
                } else {
                    onError.accept(cause);
                }
            } catch (InterruptedException | CancellationException e) {
                // cancelled: nothing to deliver
            }
        }
    }
}
