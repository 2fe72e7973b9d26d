package org.streetcomb.write;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.streetcomb.ExitCode;
import org.streetcomb.cli.Main;
import org.streetcomb.report.HeadlessChromium;

/**
 * The printable direction sheet as a crew gets it: planned on the demo town in trips, printed to PDF by
 * headless Chromium (the reference for what a browser's print does with the page) and read back with Apache
 * PDFBox. Every page is A4 (ISO 216: 210 x 297 mm, 595.28 x 841.89 pt at 72 pt to the inch); every trip after
 * the first starts a page of its own, headed by its number, distance and duration; the column names are
 * repeated on every page of directions; the caution is on the first page and the last.
 */
class DirectionSheetPrintTest {

    @TempDir
    Path folder;

    @Test
    void eachTripPrintsOnA4PagesOfItsOwn() throws Exception {
        Path html = folder.resolve("sheet.html");
        StringWriter out = new StringWriter();
        int code = Main.run(new String[] {"plan", "fixtures/demo/brackenford.geojson", "--depot=-31.2,44.6",
            "--max-trip-km", "6", "--trip-restarts", "0", "--directions", html.toString(), "-q"},
                new PrintWriter(out), new PrintWriter(new StringWriter()));
        assertEquals(ExitCode.OK, code, out.toString());
        Path pdf = folder.resolve("sheet.pdf");
        Process chromium = new ProcessBuilder(HeadlessChromium.executable().toString(), "--headless", "--no-sandbox",
                "--disable-gpu", "--no-pdf-header-footer", "--user-data-dir=" + folder.resolve("profile"),
                "--print-to-pdf=" + pdf, html.toUri().toString())
                .redirectErrorStream(true).redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
        assertTrue(chromium.waitFor(120, TimeUnit.SECONDS), "chromium printed within two minutes");
        assertTrue(Files.size(pdf) > 0);

        List<String> pages = new ArrayList<>();
        try (PDDocument document = Loader.loadPDF(pdf.toFile())) {
            for (PDPage page : document.getPages()) {
                assertEquals(595.28, page.getMediaBox().getWidth(), 1.0, "A4 width");
                assertEquals(841.89, page.getMediaBox().getHeight(), 1.0, "A4 height");
            }
            PDFTextStripper stripper = new PDFTextStripper();
            for (int p = 1; p <= document.getNumberOfPages(); p++) {
                stripper.setStartPage(p);
                stripper.setEndPage(p);
                pages.add(stripper.getText(document).strip());
            }
        }
        Matcher heading = Pattern.compile("Trip (\\d+) of (\\d+)").matcher(String.join("\n", pages));
        assertTrue(heading.find(), "the sheet has trip headings");
        int trips = Integer.parseInt(heading.group(2));
        assertTrue(trips >= 3, "the demo town in 6 km trips makes several trips: " + trips);
        assertTrue(pages.get(0).contains("Plans are advice"), "the caution heads the first page");
        assertTrue(pages.get(pages.size() - 1).contains("Plans are advice"), "and closes the last");
        int found = 1;
        for (String page : pages) {
            Matcher m = Pattern.compile("^Trip (\\d+) of " + trips + "\\R[\\d.]+ km: service .* about ").matcher(page);
            if (m.find()) {
                int trip = Integer.parseInt(m.group(1));
                if (trip > 1) {
                    assertEquals(found + 1, trip, "trips in order, each heading a page");
                    found = trip;
                }
            }
            if (page.matches("(?s).*\\b(Turn|Bear|Continue|Make a U-turn|Start on)\\b.*")) {
                assertTrue(page.contains("Step") && page.contains("Instruction"), "column names on every page:\n" + page);
            }
        }
        assertEquals(trips, found, "every trip after the first starts a page");
    }
}
