package org.sightwork.celestial.drill;

import java.time.Instant;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * One student's grade: per sight, per fix, the mistakes recognised and the score. The GUI's drill
 * mode shows {@link FixGrade#student()}, {@link FixGrade#keyFix()} and {@link FixGrade#truth()} on
 * the chart.
 *
 * @param student the student's name
 * @param file the answer file
 * @param sights one grade per sight of the key, in the log's order
 * @param fixes one grade per fix of the key
 * @param unmatchedFixes the student's fixes that match no fix asked for
 * @param score the score (points, [0, 100])
 * @param fixesOnly true when no per-sight working was handed in (the fixes carry all the points)
 * @param comments plain-language comments, one per finding, in the order of the working
 * @param problems what could not be read from the answer file
 */
public record StudentGrade(String student, String file, List<SightGrade> sights, List<FixGrade> fixes,
        List<StudentAnswers.FixAnswer> unmatchedFixes, double score, boolean fixesOnly, List<String> comments,
        List<String> problems) {

    /** Copies the lists. */
    public StudentGrade {
        sights = List.copyOf(sights);
        fixes = List.copyOf(fixes);
        unmatchedFixes = List.copyOf(unmatchedFixes);
        comments = List.copyOf(comments);
        problems = List.copyOf(problems);
    }

    /**
     * The grade of one sight.
     *
     * @param number the sight's number
     * @param body the body
     * @param hoErrorArcmin the student's Ho − the key's (minutes of arc), if Ho was given
     * @param interceptErrorNm the student's intercept − the key's (nm), if given
     * @param hoPoints points earned for Ho
     * @param interceptPoints points earned for the intercept
     * @param mistakes the mistakes recognised (more than one of a stage when they cannot be told apart)
     * @param ambiguous true when the student's number fits more than one mistake equally
     */
    public record SightGrade(int number, String body, OptionalDouble hoErrorArcmin, OptionalDouble interceptErrorNm,
            double hoPoints, double interceptPoints, List<Mistake> mistakes, boolean ambiguous) {
        /** Copies the list. */
        public SightGrade {
            mistakes = List.copyOf(mistakes);
        }
    }

    /**
     * The grade of one fix.
     *
     * @param session the session
     * @param utc the fix's time
     * @param student the student's fix, if one matched
     * @param keyFix the key's fix from the correctly worked sights
     * @param truth the true position
     * @param errorFromKeyNm distance from the student's fix to the key's (nm), if matched
     * @param errorFromTruthNm distance from the student's fix to the truth (nm), if matched
     * @param points points earned
     * @param mistakes mistakes recognised in the fix itself
     */
    public record FixGrade(String session, Instant utc, Optional<AnswerKey.Position> student, AnswerKey.Position keyFix,
            AnswerKey.Position truth, OptionalDouble errorFromKeyNm, OptionalDouble errorFromTruthNm, double points,
            List<Mistake> mistakes) {
        /** Copies the list. */
        public FixGrade {
            mistakes = List.copyOf(mistakes);
        }
    }

    /** @return every mistake recognised, sight by sight then fix by fix */
    public List<Mistake> allMistakes() {
        java.util.ArrayList<Mistake> all = new java.util.ArrayList<>();
        sights.forEach(s -> all.addAll(s.mistakes()));
        fixes.forEach(f -> all.addAll(f.mistakes()));
        return all;
    }
}
