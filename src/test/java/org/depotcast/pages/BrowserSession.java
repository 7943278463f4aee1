package org.depotcast.pages;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import io.quarkus.test.common.http.TestHTTPResource;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.TestInfo;
import org.openqa.selenium.By;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.logging.LogEntry;
import org.openqa.selenium.logging.LogType;
import org.openqa.selenium.logging.LoggingPreferences;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.WebDriverWait;

import java.io.IOException;
import java.net.URL;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.logging.Level;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.fail;

/**
 * Base of the browser tests: Debian's Chromium, headless, driven through /usr/bin/chromedriver (nothing is
 * downloaded), with a fresh profile per test. Gives sign-in through the form, phone and desk window sizes, going
 * offline through DevTools, and {@link #assertNoPageErrors} which fails on any JavaScript error or failed request
 * the pages made (from the browser log and the DevTools network events). Without Chromium the tests are skipped.
 */
public abstract class BrowserSession {
    static final Path CHROMIUM = Path.of("/usr/bin/chromium");
    static final Path CHROMEDRIVER = Path.of("/usr/bin/chromedriver");
    private static final ObjectMapper JSON = new ObjectMapper();

    @TestHTTPResource("/")
    URL base;

    protected ChromeDriver driver;
    private Path profile;
    private final List<String> problems = new ArrayList<>();
    private final Map<String, String> requests = new HashMap<>();

    @BeforeEach
    protected void openBrowser() throws IOException {
        Assumptions.assumeTrue(Files.isExecutable(CHROMIUM) && Files.isExecutable(CHROMEDRIVER),
                "Browser tests skipped: Chromium is not installed here (apt-get install -y chromium chromium-driver, as .ci/run does)");
        System.setProperty("webdriver.chrome.driver", CHROMEDRIVER.toString());
        profile = Files.createTempDirectory("depotcast-chromium");
        ChromeOptions options = new ChromeOptions();
        options.setBinary(CHROMIUM.toFile());
        options.addArguments("--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run",
                "--disable-background-networking", "--disable-component-update", "--disable-sync",
                "--disable-dev-shm-usage", "--window-size=1280,900", "--user-data-dir=" + profile);
        LoggingPreferences logs = new LoggingPreferences();
        logs.enable(LogType.BROWSER, Level.ALL);
        logs.enable(LogType.PERFORMANCE, Level.ALL);
        options.setCapability("goog:loggingPrefs", logs);
        ChromeDriverService service = new ChromeDriverService.Builder().usingDriverExecutable(CHROMEDRIVER.toFile())
                .withSilent(true).build();
        driver = new ChromeDriver(service, options);
        driver.manage().timeouts().scriptTimeout(Duration.ofSeconds(30));
    }

    @AfterEach
    protected void closeBrowser(TestInfo test) throws IOException {
        if (driver == null) {
            return;
        }
        try {
            Path shots = Path.of("target", "browser-screens");
            Files.createDirectories(shots);
            Files.write(shots.resolve(test.getTestClass().map(Class::getSimpleName).orElse("test") + "-"
                    + test.getTestMethod().map(m -> m.getName()).orElse("end") + ".png"), driver.getScreenshotAs(OutputType.BYTES));
        } finally {
            driver.quit();
            try (Stream<Path> files = Files.walk(profile)) {
                files.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
            }
        }
    }

    protected void open(String path) {
        driver.get(url(path));
    }

    protected String url(String path) {
        return base.toString().replaceAll("/$", "") + path;
    }

    /** Signs in through the form and waits until the browser has left the sign-in page. */
    protected void signIn(String username, String password) {
        open("/sign-in.html");
        fillSignIn(username, password);
        wait(Duration.ofSeconds(20)).until(d -> !d.getCurrentUrl().contains("/sign-in"));
    }

    protected void fillSignIn(String username, String password) {
        driver.findElement(By.id("username")).sendKeys(username);
        driver.findElement(By.id("password")).sendKeys(password);
        driver.findElement(By.cssSelector("#sign-in button[type=submit]")).click();
    }

    protected WebDriverWait wait(Duration timeout) {
        return new WebDriverWait(driver, timeout);
    }

    /** Waits until the page says it shows its data (body[data-ready]). */
    protected void waitReady() {
        wait(Duration.ofSeconds(30)).until(ExpectedConditions.attributeToBe(By.tagName("body"), "data-ready", "true"));
    }

    protected WebElement waitFor(By by) {
        return wait(Duration.ofSeconds(30)).until(ExpectedConditions.visibilityOfElementLocated(by));
    }

    /** Milliseconds from the start of navigation until the page marked itself ready. */
    protected double readyMillis() {
        Object value = driver.executeScript(
                "const m = performance.getEntriesByName('depotcast-ready'); return m.length ? m[0].startTime : null;");
        return value == null ? Double.NaN : ((Number) value).doubleValue();
    }

    /** A phone's screen (360 CSS px wide) or a desk screen (1280 px). */
    protected void phone() {
        driver.executeCdpCommand("Emulation.setDeviceMetricsOverride",
                Map.of("width", 360, "height", 740, "deviceScaleFactor", 2, "mobile", true));
    }

    protected void desk() {
        driver.executeCdpCommand("Emulation.setDeviceMetricsOverride",
                Map.of("width", 1280, "height", 900, "deviceScaleFactor", 1, "mobile", false));
    }

    /** Cuts the browser off the network (DevTools network emulation), or restores it. */
    protected void offline(boolean off) {
        driver.executeCdpCommand("Network.enable", Map.of());
        driver.executeCdpCommand("Network.emulateNetworkConditions", Map.of("offline", off, "latency", 0,
                "downloadThroughput", -1, "uploadThroughput", -1));
    }

    /** Saves a screenshot of the whole page under target/browser-screens/ (to look at what a user sees). */
    protected Path screenshot(String name) throws IOException {
        Object height = driver.executeScript("return document.documentElement.scrollHeight");
        Map<String, Object> shot = driver.executeCdpCommand("Page.captureScreenshot", Map.of("captureBeyondViewport", true,
                "clip", Map.of("x", 0, "y", 0, "width", driver.executeScript("return document.documentElement.clientWidth"),
                        "height", height, "scale", 1)));
        Path file = Path.of("target", "browser-screens", name + ".png");
        Files.createDirectories(file.getParent());
        Files.write(file, java.util.Base64.getDecoder().decode((String) shot.get("data")));
        return file;
    }

    /**
     * Fails the test if any page logged a JavaScript error or a request failed (HTTP status 400 or more, or no
     * answer) since the browser started. A problem line containing one of {@code expected} is allowed (e.g. the
     * 401 of a failed sign-in). Requests the browser cancelled itself while leaving a page are not failures.
     */
    protected void assertNoPageErrors(String... expected) {
        collect();
        List<String> unexpected = problems.stream().filter(p -> Arrays.stream(expected).noneMatch(p::contains)).toList();
        if (!unexpected.isEmpty()) {
            fail("The pages had errors:\n  " + String.join("\n  ", unexpected));
        }
    }

    /** The problems seen so far (already collected lines stay), for tests that expect particular ones. */
    protected List<String> pageProblems() {
        collect();
        return List.copyOf(problems);
    }

    private void collect() {
        for (LogEntry entry : driver.manage().logs().get(LogType.BROWSER)) {
            if (entry.getLevel().intValue() >= Level.SEVERE.intValue()) {
                problems.add("browser log: " + entry.getMessage());
            }
        }
        for (LogEntry entry : driver.manage().logs().get(LogType.PERFORMANCE)) {
            network(entry.getMessage());
        }
    }

    /**
     * Only requests to this server count: the browser's own start-up traffic (Debian's Chromium opens a search
     * engine's new-tab page) is not the pages'. A page that reaches for another site at all is a problem, though:
     * everything the pages need ships inside the application.
     */
    private void network(String raw) {
        try {
            JsonNode message = JSON.readTree(raw).path("message");
            String method = message.path("method").asText();
            JsonNode params = message.path("params");
            String server = base.toString().replaceAll("/$", "");
            switch (method) {
                case "Network.requestWillBeSent" -> {
                    String url = params.path("request").path("url").asText();
                    requests.put(params.path("requestId").asText(), params.path("request").path("method").asText() + " " + url);
                    if (params.path("documentURL").asText().startsWith(server) && !url.startsWith(server)
                            && !url.startsWith("data:") && !url.startsWith("blob:") && !url.startsWith("about:")) {
                        problems.add("request to another site " + url);
                    }
                }
                case "Network.responseReceived" -> {
                    int status = params.path("response").path("status").asInt();
                    if (status >= 400 && params.path("response").path("url").asText().startsWith(server)) {
                        problems.add("HTTP " + status + " " + requests.getOrDefault(params.path("requestId").asText(),
                                params.path("response").path("url").asText()));
                    }
                }
                case "Network.loadingFailed" -> {
                    String request = requests.get(params.path("requestId").asText());
                    if (request != null && request.contains(server) && !params.path("canceled").asBoolean()
                            && !"net::ERR_ABORTED".equals(params.path("errorText").asText())) {
                        problems.add("request failed (" + params.path("errorText").asText() + ") " + request);
                    }
                }
                default -> {
                }
            }
        } catch (IOException e) {
            problems.add("unreadable DevTools event: " + raw);
        }
    }
}
