package org.sightwork.geo.testing;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.sightwork.geo.app.Main;

/**
 * For tests: one run of the {@code sightwork} command line in this process, with what it wrote to
 * standard output and standard error. Published in geo's test jar for the plugin module's tests.
 *
 * <pre>{@code
 * CliRun r = CliRun.run("fix", log.toString(), "--format", "json");
 * assertEquals(0, r.code(), r.err());
 * }</pre>
 *
 * @param code the exit code
 * @param out what it wrote to standard output
 * @param err what it wrote to standard error
 */
public record CliRun(int code, String out, String err) {

    /**
     * Runs the command line ({@link Main#run}) with captured streams.
     *
     * @param args the arguments, as typed after {@code sightwork}
     * @return the exit code and the two streams' text
     */
    public static CliRun run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
        return new CliRun(code, out.toString(), err.toString());
    }
}
