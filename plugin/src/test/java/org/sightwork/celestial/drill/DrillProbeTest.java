package org.sightwork.celestial.drill;

import org.junit.jupiter.api.Test;
import org.sightwork.celestial.almanac.Almanac;

class DrillProbeTest {
    @Test
    void probe() throws Exception {
        String json = new String(getClass().getResourceAsStream("/org/sightwork/celestial/demo/drill-scenario.json").readAllBytes(), "UTF-8");
        Scenario sc = ScenarioReader.parse(json, "demo");
        try {
            DrillPack p = DrillGenerator.generate(sc, 42, Almanac.standard());
            System.out.println(SightLogCsv.csv(p.sights(), sc.observer(), true));
            System.out.println(p.deckLog().csv());
            for (AnswerKey.FixKey f : p.key().fixes()) System.out.println(f);
            System.out.println(AnswerKeyIo.toJson(p.key()).substring(0, 3000));
        } catch (DrillException e) { System.out.println("REFUSED:\n" + e.getMessage()); }
    }
}
