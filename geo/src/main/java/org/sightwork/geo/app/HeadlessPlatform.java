package org.sightwork.geo.app;

import java.util.concurrent.Callable;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;
import javafx.application.Platform;

/**
 * Starts the JavaFX platform without a display: the Monocle headless platform with software
 * rendering ({@code glass.platform=Monocle}, {@code monocle.platform=Headless},
 * {@code prism.order=sw}), set as system properties before the toolkit starts. Used by
 * {@code sightwork chart} and by the tests.
 *
 * <p><b>Thread safety:</b> {@link #start()} may be called from any thread, any number of times.
 */
public final class HeadlessPlatform {

    private static boolean started;

    private HeadlessPlatform() {
    }

    /** Starts the platform once; later calls return at once. */
    public static synchronized void start() {
        if (started) {
            return;
        }
        System.setProperty("glass.platform", "Monocle");
        System.setProperty("monocle.platform", "Headless");
        System.setProperty("prism.order", "sw");
        System.setProperty("java.awt.headless", "true");
        CountDownLatch up = new CountDownLatch(1);
        try {
            Platform.startup(up::countDown);
        } catch (IllegalStateException alreadyRunning) {
            up.countDown();
        }
        try {
            if (!up.await(30, TimeUnit.SECONDS)) {
                throw new IllegalStateException("the JavaFX platform did not start within 30 s");
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while starting JavaFX", e);
        }
        Platform.setImplicitExit(false);
        started = true;
    }

    /**
     * Runs code on the JavaFX application thread and waits for its result.
     *
     * @param <T> the result type
     * @param work the code
     * @return its result
     * @throws IllegalStateException wrapping what the code threw
     */
    public static <T> T call(Callable<T> work) {
        if (Platform.isFxApplicationThread()) {
            try {
                return work.call();
            } catch (RuntimeException e) {
                throw e;
            } catch (Exception e) {
                throw new IllegalStateException(e.getMessage(), e);
            }
        }
        CompletableFuture<T> f = new CompletableFuture<>();
        Platform.runLater(() -> {
            try {
                f.complete(work.call());
            } catch (Throwable t) {
                f.completeExceptionally(t);
            }
        });
        try {
            return f.get(120, TimeUnit.SECONDS);
        } catch (ExecutionException e) {
            if (e.getCause() instanceof RuntimeException r) {
                throw r;
            }
            throw new IllegalStateException(e.getCause().getMessage(), e.getCause());
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted", e);
        } catch (java.util.concurrent.TimeoutException e) {
            throw new IllegalStateException("the JavaFX thread did not answer within 120 s", e);
        }
    }
}
