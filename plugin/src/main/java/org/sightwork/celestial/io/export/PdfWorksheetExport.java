package org.sightwork.celestial.io.export;

import org.sightwork.geo.files.SafeWrite;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.font.PDType1Font;
import org.apache.pdfbox.pdmodel.font.Standard14Fonts;

/**
 * Prints a {@link WorksheetReport} as an A4 PDF with PDFBox: the title, then each section as a
 * heading over two columns (label, value), breaking pages as needed, and the footer at the end.
 *
 * <p><b>Limits:</b> the standard Helvetica fonts carry only the WinAnsi characters: the prime ′ and
 * double prime ″ are printed as ' and ", the minus sign − as -, any other character outside WinAnsi
 * as ?. The degree sign is in WinAnsi and prints as it is.
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class PdfWorksheetExport {

    private static final float MARGIN_PT = 50f;
    private static final float TITLE_PT = 16f;
    private static final float HEADING_PT = 11f;
    private static final float BODY_PT = 9.5f;
    private static final float LEADING = 1.35f;
    private static final float VALUE_COLUMN_PT = 230f;

    private PdfWorksheetExport() {
    }

    /**
     * Writes the worksheet (through a temporary file and a rename).
     *
     * @param report what to print
     * @param target the file
     * @throws IOException if the file cannot be written; the target is then unchanged
     */
    public static void write(WorksheetReport report, Path target) throws IOException {
        SafeWrite.writeFile(target, SafeWrite.Previous.DISCARD, tmp -> {
            try (PDDocument doc = new PDDocument()) {
                PDDocumentInformation info = doc.getDocumentInformation();
                info.setTitle(report.title());
                info.setCreator("Sightwork");
                new Layout(doc).print(report);
                doc.save(tmp.toFile());
            }
        });
    }

    /** Keeps the current page and the writing position. */
    private static final class Layout {
        private final PDDocument doc;
        private final PDType1Font regular = new PDType1Font(Standard14Fonts.FontName.HELVETICA);
        private final PDType1Font bold = new PDType1Font(Standard14Fonts.FontName.HELVETICA_BOLD);
        private PDPageContentStream out;
        private float y;
        private int pageNumber;

        Layout(PDDocument doc) {
            this.doc = doc;
        }

        void print(WorksheetReport r) throws IOException {
            newPage();
            text(bold, TITLE_PT, MARGIN_PT, r.title());
            y -= TITLE_PT * LEADING;
            if (!r.subtitle().isEmpty()) {
                text(regular, BODY_PT, MARGIN_PT, r.subtitle());
                y -= BODY_PT * LEADING;
            }
            for (WorksheetReport.Section s : r.sections()) {
                need(HEADING_PT * LEADING * 2 + BODY_PT * LEADING * Math.min(3, s.rows().size()));
                y -= HEADING_PT * 0.8f;
                text(bold, HEADING_PT, MARGIN_PT, s.heading());
                y -= HEADING_PT * LEADING;
                for (WorksheetReport.Row row : s.rows()) {
                    need(BODY_PT * LEADING);
                    text(regular, BODY_PT, MARGIN_PT + 8, row.label());
                    text(regular, BODY_PT, MARGIN_PT + VALUE_COLUMN_PT, row.value());
                    y -= BODY_PT * LEADING;
                }
            }
            if (!r.footer().isEmpty()) {
                y -= BODY_PT;
                for (String line : wrap(r.footer(), 100)) {
                    need(BODY_PT * LEADING);
                    text(regular, BODY_PT, MARGIN_PT, line);
                    y -= BODY_PT * LEADING;
                }
            }
            out.close();
        }

        private void need(float heightPt) throws IOException {
            if (y - heightPt < MARGIN_PT) {
                out.close();
                newPage();
            }
        }

        private void newPage() throws IOException {
            PDPage page = new PDPage(PDRectangle.A4);
            doc.addPage(page);
            pageNumber++;
            out = new PDPageContentStream(doc, page);
            y = page.getMediaBox().getHeight() - MARGIN_PT;
            text(regular, 7.5f, page.getMediaBox().getWidth() - MARGIN_PT - 40, "page " + pageNumber);
        }

        private void text(PDType1Font font, float size, float x, String s) throws IOException {
            out.beginText();
            out.setFont(font, size);
            out.newLineAtOffset(x, y);
            out.showText(winAnsi(font, s));
            out.endText();
        }
    }

    /**
     * The text with every character the font cannot show replaced.
     *
     * @param font the font
     * @param s the text
     * @return printable text
     */
    static String winAnsi(PDType1Font font, String s) {
        StringBuilder b = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            String r = switch (c) {
                case '\u2032' -> "'";
                case '\u2033' -> "\"";
                case '\u2212' -> "-";
                case '\t', '\n', '\r' -> " ";
                default -> String.valueOf(c);
            };
            try {
                font.encode(r);
                b.append(r);
            } catch (IOException | IllegalArgumentException e) {
                b.append('?');
            }
        }
        return b.toString();
    }

    private static List<String> wrap(String text, int columns) {
        List<String> lines = new ArrayList<>();
        // The text may come wrapped for a terminal: one paragraph per blank line.
        for (String paragraph : text.split("\n\\s*\n")) {
            StringBuilder line = new StringBuilder();
            for (String word : paragraph.trim().split("\\s+")) {
                if (line.length() + word.length() + 1 > columns && line.length() > 0) {
                    lines.add(line.toString());
                    line.setLength(0);
                }
                if (line.length() > 0) {
                    line.append(' ');
                }
                line.append(word);
            }
            lines.add(line.toString());
        }
        return lines;
    }
}
