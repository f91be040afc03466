package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.Duration;
import java.util.List;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.openqa.selenium.By;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.TakesScreenshot;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.Select;
import org.openqa.selenium.support.ui.WebDriverWait;

/**
 * The pages in a real browser: Debian's headless Chromium driven by Debian's chromedriver (tests/run
 * installs both; nothing is downloaded). Opens every page, runs a check, uploads a file (and one
 * in the background), checks that a grade named {@code <script>alert(1)</script>} shows as text,
 * and saves screenshots under tests/target/screenshots.
 */
@Tag("slow")
class BrowserTest {

    private static final Path SCREENSHOTS = Path.of("target", "screenshots");

    @TempDir
    static Path folder;

    private static RunningServer server;
    private static WebDriver browser;

    @BeforeAll
    static void start() throws Exception {
        server = RunningServer.withDemo(folder, null);
        Path hostile = folder.resolve("hostile.csv");
        Files.writeString(hostile, "# grade: <script>alert(1)</script>\n# family: invented family\n# temperature: 20 °C\n"
                + "H [kA/m],J [T]\n50,1.2913\n0,1.2888\n-400,1.2636\n-800,1.2382\n-1100,1.1871\n-1300,0.9\n-1400,0.2\n-1500,0\n");
        assertEquals(0, CliRun.of("import", hostile.toString(), "--db", folder.resolve("library").toString()).exitCode());
        ChromeDriverService service = new ChromeDriverService.Builder()
                .usingDriverExecutable(new File("/usr/bin/chromedriver")).usingAnyFreePort()
                .withLogFile(folder.resolve("chromedriver.log").toFile()).build();
        ChromeOptions options = new ChromeOptions();
        options.setBinary("/usr/bin/chromium");
        options.addArguments("--headless", "--no-sandbox", "--disable-gpu", "--disable-dev-shm-usage",
                "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run",
                "--disable-quic", "--window-size=1200,900", "--user-data-dir=" + folder.resolve("profile"));
        browser = new ChromeDriver(service, options);
        Files.createDirectories(SCREENSHOTS);
    }

    @AfterAll
    static void stop() {
        if (browser != null) {
            browser.quit();
        }
        if (server != null) {
            server.close();
        }
    }

    private void open(String path) {
        browser.get(server.uri(path).toString());
    }

    private void screenshot(String name) throws Exception {
        File shot = ((TakesScreenshot) browser).getScreenshotAs(OutputType.FILE);
        Files.copy(shot.toPath(), SCREENSHOTS.resolve(name + ".png"), StandardCopyOption.REPLACE_EXISTING);
    }

    @Test
    void the_library_lists_the_grades_and_shows_a_script_name_as_text() throws Exception {
        open("/");
        assertEquals("Library", browser.findElement(By.tagName("h1")).getText());
        String table = browser.findElement(By.tagName("table")).getText();
        assertTrue(table.contains("DEMO NdFeB 40/160"), table);
        assertTrue(table.contains("<script>alert(1)</script>"), "the hostile name appears as text");
        assertTrue(browser.findElements(By.tagName("script")).isEmpty(), "no script element reached the page");
        screenshot("library");
    }

    @Test
    void a_grade_page_shows_its_chart_and_characterization() throws Exception {
        open("/");
        browser.findElement(By.linkText("DEMO SmCo 28/200")).click();
        new WebDriverWait(browser, Duration.ofSeconds(10)).until(ExpectedConditions.titleContains("DEMO SmCo 28/200"));
        assertTrue(browser.getPageSource().contains("Characterization"));
        assertTrue(!browser.findElements(By.cssSelector("img, svg, object")).isEmpty(), "the chart is on the page");
        screenshot("grade");
    }

    @Test
    void a_check_runs_in_the_page_and_shows_its_results_and_cautions() throws Exception {
        open("/check");
        new Select(browser.findElement(By.name("grade"))).selectByVisibleText("DEMO NdFeB 40/160");
        browser.findElement(By.name("diameter")).sendKeys("10mm");
        browser.findElement(By.name("length")).sendKeys("5mm");
        browser.findElement(By.name("temperature")).sendKeys("120C");
        browser.findElement(By.cssSelector("button[type=submit]")).click();
        new WebDriverWait(browser, Duration.ofSeconds(15)).until(ExpectedConditions.presenceOfElementLocated(By.cssSelector("table.results")));
        String results = browser.findElement(By.cssSelector("table.results")).getText();
        assertTrue(results.contains("operating point"), results);
        assertTrue(results.contains("maximum working temperature"), results);
        assertTrue(browser.getPageSource().contains("confirm them by measurement"), "the caution is shown");
        screenshot("check");
    }

    @Test
    void element_files_uploaded_on_the_check_page_show_their_summary_and_map() throws Exception {
        List<String> paths = new java.util.ArrayList<>();
        for (int i = 0; i < 3; i++) {
            Path file = folder.resolve(ExampleElementFiles.NAMES.get(i));
            Files.writeString(file, ExampleElementFiles.text(i));
            paths.add(file.toAbsolutePath().toString());
        }
        open("/check");
        org.openqa.selenium.WebElement form = browser.findElement(By.cssSelector("form.upload"));
        new Select(form.findElement(By.name("grade"))).selectByVisibleText("DEMO NdFeB 40/160");
        form.findElement(By.name("temperature")).sendKeys("80C");
        new Select(form.findElement(By.name("plane"))).selectByValue("xz");
        form.findElement(By.cssSelector("input[type=file]")).sendKeys(String.join("\n", paths));
        form.findElement(By.cssSelector("button[type=submit]")).click();
        new WebDriverWait(browser, Duration.ofSeconds(20)).until(ExpectedConditions.presenceOfElementLocated(By.id("element-results")));
        String summary = browser.findElement(By.cssSelector("#element-results + table")).getText();
        assertTrue(summary.contains("irreversible loss of the moment"), summary);
        assertTrue(summary.contains("250"), summary);
        org.openqa.selenium.WebElement map = browser.findElement(By.cssSelector("img[src^='/charts/elements/']"));
        new WebDriverWait(browser, Duration.ofSeconds(20)).until(driver -> ((Number) ((org.openqa.selenium.JavascriptExecutor) driver)
                .executeScript("return arguments[0].naturalWidth", map)).intValue() > 0);
        screenshot("element-check");
        browser.findElement(By.linkText("xy")).click();
        new WebDriverWait(browser, Duration.ofSeconds(20)).until(ExpectedConditions.urlContains("plane=xy"));
        org.openqa.selenium.WebElement xy = browser.findElement(By.cssSelector("img[src^='/charts/elements/']"));
        new WebDriverWait(browser, Duration.ofSeconds(20)).until(driver -> ((Number) ((org.openqa.selenium.JavascriptExecutor) driver)
                .executeScript("return arguments[0].naturalWidth", xy)).intValue() > 0);
        screenshot("element-map-xy");
    }

    @Test
    void a_file_uploaded_on_the_import_page_is_checked_then_imported() throws Exception {
        Path file = folder.resolve("upload.csv");
        Files.writeString(file, "# grade: Invented browser grade\n# family: invented family\n# temperature: 20 °C\n"
                + "H [kA/m],J [T]\n50,1.2913\n0,1.2888\n-400,1.2636\n-800,1.2382\n-1100,1.1871\n-1300,0.9\n-1400,0.2\n-1500,0\n");
        open("/import");
        browser.findElement(By.cssSelector("input[type=file]")).sendKeys(file.toAbsolutePath().toString());
        browser.findElement(By.cssSelector("form.upload button[type=submit]")).click();
        new WebDriverWait(browser, Duration.ofSeconds(15)).until(ExpectedConditions.textToBePresentInElementLocated(By.tagName("body"),
                "Invented browser grade"));
        screenshot("import-check");
        List<org.openqa.selenium.WebElement> confirm = browser.findElements(By.xpath("//button[contains(., 'Import these files')]"));
        assertEquals(1, confirm.size(), "a confirm button after the check");
        confirm.get(0).click();
        new WebDriverWait(browser, Duration.ofSeconds(15)).until(driver -> server.library.reader().grade("Invented browser grade").isPresent());
        open("/select");
        assertTrue(browser.getPageSource().contains("Rank the grades"));
        screenshot("select");
    }

    @Test
    void a_file_imported_in_the_background_ends_on_its_job_page_with_a_link_to_its_grade() throws Exception {
        Path file = folder.resolve("background.csv");
        Files.writeString(file, "# grade: Invented background grade\n# family: invented family\n# temperature: 20 °C\n"
                + "H [kA/m],J [T]\n50,1.2913\n0,1.2888\n-400,1.2636\n-800,1.2382\n-1100,1.1871\n-1300,0.9\n-1400,0.2\n-1500,0\n");
        open("/import");
        browser.findElement(By.cssSelector("input[type=file]")).sendKeys(file.toAbsolutePath().toString());
        browser.findElement(By.cssSelector("form.upload button[type=submit]")).click();
        new WebDriverWait(browser, Duration.ofSeconds(15)).until(ExpectedConditions.presenceOfElementLocated(
                By.xpath("//button[contains(., 'Import in the background')]"))).click();
        new WebDriverWait(browser, Duration.ofSeconds(30)).until(ExpectedConditions.presenceOfElementLocated(
                By.linkText("Invented background grade")));
        assertTrue(browser.getCurrentUrl().matches(".*/jobs/[0-9a-f]{32}"), browser.getCurrentUrl());
        assertTrue(browser.getPageSource().contains("files checked: 1 of 1"), "the counts stay on the finished job's page");
        screenshot("import-job");
        browser.findElement(By.linkText("Invented background grade")).click();
        new WebDriverWait(browser, Duration.ofSeconds(10)).until(ExpectedConditions.titleContains("Invented background grade"));
    }

    @Test
    void the_field_page_shows_the_map_and_field_lines_of_a_cylinder() throws Exception {
        open("/field");
        browser.findElement(By.linkText("Field")).click();
        open("/field?shape=cylinder&diameter=10mm&length=5mm&br=1.3T");
        new WebDriverWait(browser, Duration.ofSeconds(15)).until(ExpectedConditions.presenceOfElementLocated(
                By.cssSelector("img[src*='/charts/field.svg']")));
        assertTrue(browser.getPageSource().contains("cylinder"), "the magnet is described");
        screenshot("field");
    }
}
