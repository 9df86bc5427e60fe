package org.sightwork.geo.app;

import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import java.util.function.BiConsumer;
import org.sightwork.geo.spi.BackgroundTask;
import org.sightwork.geo.spi.Progress;
import org.sightwork.geo.spi.Severity;

/**
 * Runs slow work on worker threads (two daemon threads) and keeps what is running, with its
 * progress, for the status bar to show.
 *
 * <p><b>Thread safety:</b> every method may be called from any thread.
 */
public final class TaskRunner {

    /** A running task as the status bar shows it. */
    public static final class Running implements Progress {
        private final String title;
        private volatile double fraction = -1;
        private volatile String message;
        private volatile boolean cancelled;

        Running(String title) {
            this.title = title;
        }

        @Override
        public void update(double f, String m) {
            fraction = f;
            if (m != null) {
                message = m;
            }
        }

        @Override
        public boolean isCancelled() {
            return cancelled;
        }

        /** Asks the task to stop. */
        public void cancel() {
            cancelled = true;
        }

        /**
         * The title.
         *
         * @return the title
         */
        public String title() {
            return title;
        }

        /**
         * The fraction done.
         *
         * @return [0, 1], or negative when unknown
         */
        public double fraction() {
            return fraction;
        }

        /**
         * The last message.
         *
         * @return the message, or null
         */
        public String message() {
            return message;
        }
    }

    private final ExecutorService pool = Executors.newFixedThreadPool(2, r -> {
        Thread t = new Thread(r, "sightwork-worker");
        t.setDaemon(true);
        return t;
    });
    private final List<Running> running = new CopyOnWriteArrayList<>();
    private final BiConsumer<Severity, String> notifier;

    /**
     * A runner.
     *
     * @param notifier where failures are reported (any thread)
     */
    public TaskRunner(BiConsumer<Severity, String> notifier) {
        this.notifier = notifier;
    }

    /**
     * Runs a task.
     *
     * @param <T> result type
     * @param title what it is
     * @param task the work
     * @return its future
     */
    public <T> CompletableFuture<T> submit(String title, BackgroundTask<T> task) {
        Running r = new Running(title);
        running.add(r);
        CompletableFuture<T> f = new CompletableFuture<>();
        pool.execute(() -> {
            try {
                f.complete(task.run(r));
            } catch (Throwable t) {
                String m = t.getMessage() == null ? t.getClass().getSimpleName() : t.getMessage();
                notifier.accept(Severity.ERROR, title + " failed: " + m);
                f.completeExceptionally(t);
            } finally {
                running.remove(r);
            }
        });
        return f;
    }

    /**
     * What is running now.
     *
     * @return a snapshot
     */
    public List<Running> running() {
        return List.copyOf(running);
    }

    /**
     * Waits until nothing runs.
     *
     * @param timeoutMs the longest wait (milliseconds)
     * @return true if idle
     * @throws InterruptedException if interrupted
     */
    public boolean awaitIdle(long timeoutMs) throws InterruptedException {
        long end = System.currentTimeMillis() + timeoutMs;
        while (!running.isEmpty()) {
            if (System.currentTimeMillis() > end) {
                return false;
            }
            TimeUnit.MILLISECONDS.sleep(20);
        }
        return true;
    }

    /** Stops the workers. */
    public void shutdown() {
        pool.shutdownNow();
    }
}
