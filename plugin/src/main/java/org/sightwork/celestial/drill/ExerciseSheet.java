package org.sightwork.celestial.drill;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Calendar;
import java.util.GregorianCalendar;
import java.util.List;
import java.util.Locale;
import java.util.TimeZone;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.font.PDType1Font;
import org.apache.pdfbox.pdmodel.font.Standard14Fonts;
import org.sightwork.celestial.sight.Limb;
import org.sightwork.geo.app.Caution;
import org.sightwork.geo.earth.Angles;
import org.sightwork.geo.track.DrLeg;

/**
 * The printable exercise sheet of a drill (PDF, A4, by Apache PDFBox): the situation, what the
 * student is given, the sight log and the deck log, the tasks and how to hand the answers in.
 *
 * <p>Deterministic: the document's creation and modification dates are the scenario's departure
 * time and its document ID is derived from the seed (PDFBox otherwise stamps the clock), the fonts
 * are the standard Helvetica (no embedded subset with a random tag). Text is written in the
 * WinAnsi characters of those fonts: minutes as {@code '}, not {@code ′}.
 */
public final class ExerciseSheet {

    private static final float MARGIN = 50f;
    private static final float LEADING = 12.5f;
    private static final float BODY_SIZE = 9.5f;

    private ExerciseSheet() {
    }

    /**
     * @param pack the drill
     * @return the PDF's bytes
     */
    public static byte[] pdf(DrillPack pack) {
        List<Line> lines = lines(pack);
        try (PDDocument doc = new PDDocument(); ByteArrayOutputStream out = new ByteArrayOutputStream()) {
            PDType1Font regular = new PDType1Font(Standard14Fonts.FontName.HELVETICA);
            PDType1Font bold = new PDType1Font(Standard14Fonts.FontName.HELVETICA_BOLD);
            PDType1Font mono = new PDType1Font(Standard14Fonts.FontName.COURIER);
            PDRectangle a4 = PDRectangle.A4;
            float y = 0;
            PDPageContentStream cs = null;
            int pageNo = 0;
            for (Line l : lines) {
                float size = l.style == Style.TITLE ? 15f : l.style == Style.HEADING ? 11.5f : BODY_SIZE;
                float lead = l.style == Style.TITLE ? 22f : l.style == Style.HEADING ? 18f : LEADING;
                if (cs == null || y - lead < MARGIN + 20 || l.style == Style.PAGE_BREAK) {
                    if (cs != null) {
                        footer(cs, regular, a4, pageNo);
                        cs.close();
                    }
                    PDPage page = new PDPage(a4);
                    doc.addPage(page);
                    pageNo++;
                    cs = new PDPageContentStream(doc, page);
                    y = a4.getHeight() - MARGIN;
                    if (l.style == Style.PAGE_BREAK) {
                        continue;
                    }
                }
                y -= lead;
                cs.beginText();
                cs.setFont(l.style == Style.TITLE || l.style == Style.HEADING ? bold : l.style == Style.TABLE ? mono
                        : regular, l.style == Style.TABLE ? 8.5f : size);
                cs.newLineAtOffset(MARGIN, y);
                cs.showText(winAnsi(l.text));
                cs.endText();
            }
            if (cs != null) {
                footer(cs, regular, a4, pageNo);
                cs.close();
            }
            PDDocumentInformation info = new PDDocumentInformation();
            info.setTitle(winAnsi(pack.scenario().title()));
            info.setSubject("Celestial navigation drill: student exercise sheet");
            info.setCreator("Sightwork drill new");
            info.setProducer("Sightwork with Apache PDFBox");
            Calendar when = calendar(pack.track().startUtc());
            info.setCreationDate(when);
            info.setModificationDate(when);
            doc.setDocumentInformation(info);
            doc.setDocumentId(pack.seed());
            doc.save(out);
            return out.toByteArray();
        } catch (IOException e) {
            throw new IllegalStateException("the exercise sheet could not be drawn: " + e.getMessage(), e);
        }
    }

    private static void footer(PDPageContentStream cs, PDType1Font font, PDRectangle a4, int pageNo) throws IOException {
        cs.beginText();
        cs.setFont(font, 7.5f);
        cs.newLineAtOffset(MARGIN, MARGIN - 20);
        cs.showText(winAnsi("Sightwork drill - exercise sheet - page " + pageNo
                + " - an aid to training, not to navigation"));
        cs.endText();
    }

    private static Calendar calendar(Instant t) {
        GregorianCalendar c = new GregorianCalendar(TimeZone.getTimeZone("UTC"), Locale.ROOT);
        c.setTimeInMillis(t.toEpochMilli());
        return c;
    }

    /** How a line is set. */
    enum Style { TITLE, HEADING, TEXT, TABLE, PAGE_BREAK }

    /** One line of the sheet. */
    record Line(Style style, String text) {
    }

    /** The sheet as lines of text (also what the tests read). */
    static List<Line> lines(DrillPack pack) {
        Scenario sc = pack.scenario();
        ObserverProfile o = sc.observer();
        List<Line> out = new ArrayList<>();
        out.add(new Line(Style.TITLE, sc.title()));
        if (sc.invented()) {
            out.add(new Line(Style.TEXT, "INVENTED SCENARIO: the vessel and the passage are made up for training."));
        }
        out.add(new Line(Style.TEXT, "Vessel: " + sc.vesselName()));
        wrap(out, sc.description(), 100);
        out.add(new Line(Style.HEADING, "What you are given"));
        out.add(new Line(Style.TEXT, "- The sight log (sight-log.csv, and below): watch times, sextant altitudes,"
                + " the DR at each sight."));
        if (sc.gives(Scenario.Given.DR_LOG)) {
            out.add(new Line(Style.TEXT, "- The deck log (dr-log.csv, and below): heading steered and speed"
                    + " through the water."));
        }
        if (sc.gives(Scenario.Given.DEPARTURE)) {
            out.add(new Line(Style.TEXT, "- Departure: " + Angles.formatLatitude(pack.track().legs().get(0).from().latDeg())
                    + " " + Angles.formatLongitude(pack.track().legs().get(0).from().lonDeg()) + " at "
                    + pack.track().startUtc()));
        }
        out.add(new Line(Style.TEXT, String.format(Locale.ROOT, "- Height of eye %.1f m; air %.0f C, %.0f hPa.",
                o.eyeHeightM(), o.temperatureC(), o.pressureHpa())));
        if (sc.gives(Scenario.Given.INDEX_ERROR)) {
            double ie = Math.round(o.indexErrorArcmin() * 10.0) / 10.0;
            out.add(new Line(Style.TEXT, "- Index error as read before the sights: "
                    + SightLogCsv.indexError(ie).replace(" on", "' on the arc").replace(" off", "' off the arc")
                    + (ie == 0 ? "'" : "") + "."));
        } else {
            out.add(new Line(Style.TEXT, "- The index error was not read."));
        }
        if (sc.gives(Scenario.Given.WATCH_ERROR)) {
            out.add(new Line(Style.TEXT, String.format(Locale.ROOT, "- The deck watch is %.0f s %s on UTC; the sight"
                    + " log gives watch times.", Math.abs(o.watchErrorS()), o.watchErrorS() >= 0 ? "fast" : "slow")));
        } else {
            out.add(new Line(Style.TEXT, "- The sight log gives watch times; the watch was not checked against UTC."));
        }
        if (sc.gives(Scenario.Given.CURRENT)) {
            Scenario.Current c = sc.track().current();
            out.add(new Line(Style.TEXT, String.format(Locale.ROOT, "- Current: set %03.0f, drift %.1f kn.",
                    c.setDeg(), c.driftKn())));
        }
        out.add(new Line(Style.TEXT, "- Withheld: the GPS track" + (sc.gives(Scenario.Given.CURRENT) ? "."
                : " and the current.")));
        out.add(new Line(Style.HEADING, "Tasks"));
        out.add(new Line(Style.TEXT, "1. Correct each sight from Hs to Ho, reduce it from the DR given in the log"
                + " (Hc, Zn, intercept)."));
        out.add(new Line(Style.TEXT, "2. Work these fixes (carry earlier lines along the DR where the times differ):"));
        for (AnswerKey.FixKey f : pack.key().fixes()) {
            out.add(new Line(Style.TEXT, "     '" + f.session() + "' for " + f.utc() + ", from sights "
                    + f.sightNumbers().toString().replace("[", "").replace("]", "")));
        }
        out.add(new Line(Style.TEXT, "3. Hand in a CSV file (answers-template.csv shows the form):"));
        out.add(new Line(Style.TABLE, "   " + StudentAnswers.HEADER));
        out.add(new Line(Style.TABLE, "   fix,<session>,<UTC of the fix>,<lat d m.m N/S>,<lon d m.m E/W>,,"));
        out.add(new Line(Style.TABLE, "   sight,<number>,,,,<Ho d m.m>,<intercept nm, + toward / - away>"));
        out.add(new Line(Style.HEADING, "Sight log"));
        out.add(new Line(Style.TABLE, String.format(Locale.ROOT, "%-3s %-20s %-10s %-5s %-9s %-10s %-11s %-4s %-4s",
                "No", "watch time", "body", "limb", "Hs", "DR lat", "DR lon", "hdg", "kn")));
        for (LoggedSight s : pack.sights()) {
            out.add(new Line(Style.TABLE, String.format(Locale.ROOT, "%-3d %-20s %-10s %-5s %-9s %-10s %-11s %03.0f  %.1f",
                    s.number(), s.watchTime().toString(), s.body().name(),
                    s.limb() == Limb.CENTRE ? "" : s.limb() == Limb.LOWER ? "LL" : "UL",
                    SightLogCsv.altitude(s.hsDeg()), Angles.formatLatitude(s.dr().latDeg()),
                    Angles.formatLongitude(s.dr().lonDeg()), s.courseDeg(), s.speedKn())));
        }
        if (sc.gives(Scenario.Given.DR_LOG)) {
            out.add(new Line(Style.HEADING, "Deck log"));
            out.add(new Line(Style.TABLE, String.format(Locale.ROOT, "%-26s %-8s %-6s", "time (UTC)", "heading",
                    "speed")));
            for (DrLeg l : pack.deckLog().drLog().legs()) {
                out.add(new Line(Style.TABLE, String.format(Locale.ROOT, "%-26s %03.0f      %.1f", l.start(),
                        l.headingDeg(), l.stwKn())));
            }
            out.add(new Line(Style.TABLE, String.format(Locale.ROOT, "%-26s arrived", pack.deckLog().drLog().end())));
        }
        out.add(new Line(Style.HEADING, "Caution"));
        for (String c : Caution.TEXT.split("\n")) {
            out.add(new Line(Style.TEXT, c));
        }
        return out;
    }

    private static void wrap(List<Line> out, String text, int width) {
        if (text == null || text.isBlank()) {
            return;
        }
        StringBuilder line = new StringBuilder();
        for (String w : text.split("\\s+")) {
            if (line.length() + w.length() + 1 > width && line.length() > 0) {
                out.add(new Line(Style.TEXT, line.toString()));
                line.setLength(0);
            }
            line.append(line.length() == 0 ? "" : " ").append(w);
        }
        if (line.length() > 0) {
            out.add(new Line(Style.TEXT, line.toString()));
        }
    }

    /** Text in the WinAnsi characters of the standard fonts. */
    static String winAnsi(String s) {
        String t = s.replace('′', '\'').replace('″', '"').replace('−', '-').replace('–', '-').replace('—', '-');
        StringBuilder b = new StringBuilder();
        java.nio.charset.CharsetEncoder enc = java.nio.charset.Charset.forName("windows-1252").newEncoder();
        for (char ch : t.toCharArray()) {
            b.append(ch >= 32 && enc.canEncode(ch) ? ch : '?');
        }
        return b.toString();
    }

    /**
     * The sheet's text, for tests and a plain-text copy.
     *
     * @param pack the drill
     * @return the lines joined with LF
     */
    public static String text(DrillPack pack) {
        StringBuilder b = new StringBuilder();
        for (Line l : lines(pack)) {
            b.append(l.text).append('\n');
        }
        return new String(b.toString().getBytes(StandardCharsets.UTF_8), StandardCharsets.UTF_8);
    }
}
