package org.sightwork.geo.app;

/**
 * What every {@link Shell} owns in the same way, the window and the headless renderer alike: the
 * model, the worker threads (whose failures are reported through the shell's own
 * {@link Shell#notify}) and the user's files.
 *
 * <p><b>Thread:</b> as {@link Shell}; the fields are made with the shell, on the thread that makes it.
 */
abstract class ShellBase implements Shell {

    /** The layers, palette and passage time. */
    protected final ChartModel model = new ChartModel();

    /** The worker threads; their errors go to {@link #notify}. */
    protected final TaskRunner tasks = new TaskRunner(this::notify);

    /** The user's settings and files. */
    protected final UserFiles userFiles = UserFiles.defaultLocation();

    /**
     * The model (layers, palette, passage time).
     *
     * @return the model
     */
    @Override
    public ChartModel model() {
        return model;
    }

    @Override
    public TaskRunner tasks() {
        return tasks;
    }

    @Override
    public UserFiles userFiles() {
        return userFiles;
    }
}
