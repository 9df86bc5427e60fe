package org.sightwork.geo.spi;

import java.util.List;

/**
 * Contributes sub-commands to the {@code sightwork} command line. Found with
 * {@link java.util.ServiceLoader}; each returned object is a picocli {@code @Command} instance (or a
 * {@code CommandLine}) that the launcher adds under its own name.
 *
 * <p><b>Thread safety:</b> called once, on the main thread, before any command runs.
 */
public interface CommandProvider {

    /**
     * The commands this plugin adds.
     *
     * @return picocli command objects, never null
     */
    List<Object> commands();
}
