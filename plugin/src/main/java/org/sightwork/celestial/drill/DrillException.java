package org.sightwork.celestial.drill;

import java.util.List;

/**
 * A drill that cannot be read or made: a bad scenario, a sight that cannot be taken, a bad answer
 * file. The message is written for an instructor; {@link #problems()} lists every problem found.
 */
public final class DrillException extends IllegalArgumentException {

    private final List<String> problems;

    /**
     * @param problems each problem in one sentence, naming file and field; at least one
     */
    public DrillException(List<String> problems) {
        super(String.join(System.lineSeparator(), problems));
        if (problems.isEmpty()) {
            throw new IllegalArgumentException("a drill problem needs a message");
        }
        this.problems = List.copyOf(problems);
    }

    /**
     * @param problem the problem in one sentence
     */
    public DrillException(String problem) {
        this(List.of(problem));
    }

    /** @return every problem found, in the order found */
    public List<String> problems() {
        return problems;
    }
}
