package org.streetcomb.report;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.io.TempDir;

/** One headless Chromium per test class, with a scratch folder for the reports it opens. */
abstract class BrowserTestBase {

    @TempDir
    static Path folder;
    static HeadlessChromium chromium;

    @BeforeAll
    static void startBrowser() throws Exception {
        chromium = HeadlessChromium.start(Files.createDirectory(folder.resolve("profile")));
    }

    @AfterAll
    static void stopBrowser() throws Exception {
        if (chromium != null) {
            chromium.close();
            chromium = null;
        }
    }
}
