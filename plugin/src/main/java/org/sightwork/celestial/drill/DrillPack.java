package org.sightwork.celestial.drill;

import java.util.List;

/**
 * Everything a drill makes from a scenario and a seed: the student pack (sight log, deck log, the
 * exercise sheet's content) and the instructor's part (the answer key, the true track as NMEA).
 * {@link DrillPackWriter} writes it to files.
 *
 * @param scenario the scenario
 * @param seed the seed
 * @param track the true track
 * @param deckLog the deck log
 * @param sights the sights as logged, in the log's order
 * @param key the answer key
 * @param truthNmea the true track as NMEA 0183 sentences
 */
public record DrillPack(Scenario scenario, long seed, TrueTrack track, DeckLog deckLog, List<LoggedSight> sights,
        AnswerKey key, List<String> truthNmea) {

    /** Copies the lists. */
    public DrillPack {
        sights = List.copyOf(sights);
        truthNmea = List.copyOf(truthNmea);
    }
}
