package org.sightwork.geo.files;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** The quoting rules of RFC 4180 (October 2005), section 2, on its own examples where it has them. */
class CsvLineTest {

    @Test
    void splitsOnCommas() {
        // RFC 4180 section 2 rule 1 example: aaa,bbb,ccc
        assertEquals(List.of("aaa", "bbb", "ccc"), CsvLine.split("aaa,bbb,ccc").cells(), "plain cells");
    }

    @Test
    void keepsSpacesAndEmptyCells() {
        // RFC 4180 section 2 rule 4: "Spaces are considered part of a field and should not be ignored"
        assertEquals(List.of(" aaa", "", "ccc "), CsvLine.split(" aaa,,ccc ").cells(), "spaces and an empty cell");
        assertEquals(List.of("a", ""), CsvLine.split("a,").cells(), "a trailing comma is an empty last cell");
        assertEquals(List.of(""), CsvLine.split("").cells(), "an empty line is one empty cell");
    }

    @Test
    void unquotesEnclosedCells() {
        // RFC 4180 section 2 rule 5 example: "aaa","bbb","ccc"
        assertEquals(List.of("aaa", "bbb", "ccc"), CsvLine.split("\"aaa\",\"bbb\",\"ccc\"").cells(), "quoted cells");
        // rule 6: fields containing commas should be enclosed in double quotes
        assertEquals(List.of("a,b", "c"), CsvLine.split("\"a,b\",c").cells(), "a comma inside quotes");
        assertEquals(List.of("", "x"), CsvLine.split("\"\",x").cells(), "an empty quoted cell");
    }

    @Test
    void readsDoubledQuotes() {
        // RFC 4180 section 2 rule 7 example: "aaa","b""bb","ccc"
        assertEquals(List.of("aaa", "b\"bb", "ccc"), CsvLine.split("\"aaa\",\"b\"\"bb\",\"ccc\"").cells(),
                "a doubled quote is one quote");
        assertEquals(List.of("\""), CsvLine.split("\"\"\"\"").cells(), "a cell holding only a quote");
    }

    @Test
    void refusesAnOpenQuote() {
        // rule 6 allows a line break inside quotes; a line read on its own must then be refused
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> CsvLine.split("a,\"b,c"));
        assertEquals(CsvLine.UNCLOSED_QUOTE, e.getMessage(), "message");
    }

    @Test
    void cellsBeyondTheLineAreEmptyAndColumnsCountFromOne() {
        CsvLine line = CsvLine.split("x,y");
        assertEquals(2, line.size(), "size");
        assertEquals("y", line.cell(1), "second cell");
        assertEquals("", line.cell(5), "a cell past the end");
        assertEquals(1, CsvLine.column(0), "the first cell is column 1");
    }

    @Test
    void headerNamesAreStrippedAndLowerCase() {
        // RFC 4180 section 2 rule 3: the optional header line has the same format as the records
        Map<String, Integer> col = CsvLine.split(" Time_UTC ,\"lat,deg\",a,A").indexByName();
        assertEquals(0, col.get("time_utc"), "stripped, lower case");
        assertEquals(1, col.get("lat,deg"), "a quoted name");
        assertEquals(3, col.get("a"), "the later of two equal names");
    }
}
