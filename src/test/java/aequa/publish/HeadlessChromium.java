package aequa.publish;

import java.io.File;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.logging.Level;

import org.junit.jupiter.api.Assumptions;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.logging.LogType;
import org.openqa.selenium.logging.LoggingPreferences;

/**
 * Debian's Chromium, headless, through Selenium with an explicit ChromeDriver (so Selenium Manager never goes
 * to the network), with its own throw-away profile; shared by the browser tests.
 *
 * <p>In CI (environment {@code CI=true}) a missing Chromium fails the test. Elsewhere the test is skipped with a
 * printed reason when /usr/bin/chromium is absent. Install: {@code apt-get install -y chromium chromium-driver}.
 */
final class HeadlessChromium implements AutoCloseable {

    private static final Path CHROMIUM = Path.of("/usr/bin/chromium");
    private static final Path CHROMEDRIVER = Path.of("/usr/bin/chromedriver");
    static final Path SCREENSHOTS = Path.of("target", "screenshots");

    private final ChromeDriver driver;
    private final Path profile;

    private HeadlessChromium(ChromeDriver driver, Path profile) {
        this.driver = driver;
        this.profile = profile;
    }

    /** Starts Chromium with a 1280 x 1000 window, or skips the calling test (fails it in CI) when it is missing. */
    static HeadlessChromium start(String testName) throws IOException {
        boolean ci = "true".equalsIgnoreCase(System.getenv("CI"));
        boolean installed = Files.isExecutable(CHROMIUM) && Files.isExecutable(CHROMEDRIVER);
        if (!installed && ci) {
            throw new IllegalStateException("CI=true but " + CHROMIUM + " or " + CHROMEDRIVER
                    + " is missing: install them with apt-get install -y chromium chromium-driver");
        }
        if (!installed) {
            System.out.println(testName + " skipped: " + CHROMIUM + " or " + CHROMEDRIVER + " not installed");
        }
        Assumptions.assumeTrue(installed, "Chromium not installed (apt-get install -y chromium chromium-driver)");

        Path profile = Files.createTempDirectory("aequa-chromium-");
        ChromeOptions options = new ChromeOptions();
        options.setBinary(CHROMIUM.toFile());
        // flags from shared/LIBRARIES.md section 10 (verified with Chromium 156 on Debian 12)
        options.addArguments("--headless", "--no-sandbox", "--disable-gpu", "--disable-background-networking",
                "--disable-component-update", "--disable-sync", "--no-first-run", "--disable-dev-shm-usage",
                "--allow-file-access-from-files", "--window-size=1280,1000", "--user-data-dir=" + profile);
        LoggingPreferences logs = new LoggingPreferences();
        logs.enable(LogType.BROWSER, Level.ALL);
        options.setCapability("goog:loggingPrefs", logs);
        ChromeDriverService service = new ChromeDriverService.Builder().usingDriverExecutable(CHROMEDRIVER.toFile())
                .usingAnyFreePort().withLogOutput(OutputStream.nullOutputStream()).build();
        ChromeDriver driver = new ChromeDriver(service, options);
        Files.createDirectories(SCREENSHOTS);
        return new HeadlessChromium(driver, profile);
    }

    ChromeDriver driver() {
        return driver;
    }

    /** Saves what the window shows as target/screenshots/NAME and returns the file. */
    Path screenshot(String name) throws IOException {
        File shot = driver.getScreenshotAs(OutputType.FILE);
        Path target = SCREENSHOTS.resolve(name);
        Files.copy(shot.toPath(), target, StandardCopyOption.REPLACE_EXISTING);
        return target;
    }

    @Override
    public void close() throws IOException {
        driver.quit();
        StagingFolder.deleteTree(profile);
    }
}
