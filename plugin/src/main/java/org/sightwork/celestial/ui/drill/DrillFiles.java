package org.sightwork.celestial.ui.drill;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

/**
 * Where the files of a drill are: a drill directory made by {@code sightwork drill new}
 * ({@code student/} and {@code key/}), or a student pack on its own (the {@code student/}
 * directory, handed out).
 *
 * <pre>
 * student/sight-log.csv     the sights as the observer wrote them (required)
 * student/dr-log.csv        the deck log (optional: only when the scenario gives it)
 * key/answer-key.json       the answer key (the instructor's; needed to grade and reveal)
 * key/true-track.nmea       the true track, the withheld GPS (the instructor's)
 * </pre>
 *
 * @param root the directory chosen
 * @param sightLog the student's sight log
 * @param drLog the student's DR log, if given
 * @param answerKey the answer key, if this is the instructor's directory
 * @param trueTrack the true track, if this is the instructor's directory
 */
public record DrillFiles(Path root, Path sightLog, Optional<Path> drLog, Optional<Path> answerKey,
        Optional<Path> trueTrack) {

    /** The student's sight log's name in a pack. */
    public static final String SIGHT_LOG = "sight-log.csv";
    /** The student's DR log's name in a pack. */
    public static final String DR_LOG = "dr-log.csv";
    /** The answer key's name in a drill directory. */
    public static final String ANSWER_KEY = "answer-key.json";
    /** The true track's name in a drill directory. */
    public static final String TRUE_TRACK = "true-track.nmea";

    /**
     * Finds the files of a drill.
     *
     * <p>Accepted: the drill directory (with {@code student/} and {@code key/}), the student
     * directory on its own (its sibling {@code key/} is taken when it is there: the instructor's
     * copy), or the {@code key/} directory (its sibling {@code student/} is the pack).
     *
     * @param chosen the directory the user chose
     * @return the files
     * @throws IllegalArgumentException if the directory holds no sight log, with what was expected
     */
    public static DrillFiles locate(Path chosen) {
        Path dir = chosen.toAbsolutePath().normalize();
        Path student;
        Path key;
        if (Files.isRegularFile(dir.resolve("student").resolve(SIGHT_LOG))) {
            student = dir.resolve("student");
            key = dir.resolve("key");
        } else if (Files.isRegularFile(dir.resolve(SIGHT_LOG))) {
            student = dir;
            key = dir.getParent() == null ? dir.resolve("key") : dir.getParent().resolve("key");
        } else if (Files.isRegularFile(dir.resolve(ANSWER_KEY)) && dir.getParent() != null
                && Files.isRegularFile(dir.getParent().resolve("student").resolve(SIGHT_LOG))) {
            student = dir.getParent().resolve("student");
            key = dir;
        } else {
            throw new IllegalArgumentException(dir + ": not a drill pack: expected student/" + SIGHT_LOG
                    + " (a drill directory made by 'sightwork drill new') or " + SIGHT_LOG + " (a student pack)");
        }
        return new DrillFiles(dir, student.resolve(SIGHT_LOG), existing(student.resolve(DR_LOG)),
                existing(key.resolve(ANSWER_KEY)), existing(key.resolve(TRUE_TRACK)));
    }

    private static Optional<Path> existing(Path p) {
        return Files.isRegularFile(p) ? Optional.of(p) : Optional.empty();
    }

    /** @return whether the instructor's files (answer key and true track) are both here */
    public boolean isInstructorsCopy() {
        return answerKey.isPresent() && trueTrack.isPresent();
    }

    /** @return a short name for the drill: the directory's name */
    public String name() {
        Path n = root.getFileName();
        String s = n == null ? "drill" : n.toString();
        return s.equals("student") && root.getParent() != null && root.getParent().getFileName() != null
                ? root.getParent().getFileName().toString() : s;
    }
}
