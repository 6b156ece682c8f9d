package lamella.product;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.Function;
import java.util.stream.Stream;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.osgi.framework.Bundle;
import org.osgi.framework.BundleContext;
import org.osgi.framework.ServiceReference;

import lamella.launcher.FelixRuntime;

/**
 * The desktop workbench in a private runtime and user folder, its display owned by a test thread as the launcher's
 * main thread owns it. The window is driven through its control service, each command run on the UI thread as
 * the user's gesture would be. Screenshots go to target/screenshots/ for a person to look at.
 */
class WorkbenchIT {

    private static final long PATIENCE_MS = 60_000;
    private static final Path SHOTS = Path.of(System.getProperty("basedir", "."), "target", "screenshots");

    @TempDir
    static Path home;
    @TempDir
    static Path user;
    private static FelixRuntime runtime;
    private static BundleContext context;
    private static Thread ui;
    private static final AtomicReference<Throwable> uiFailure = new AtomicReference<>();
    private static Function<String, String> window;

    @BeforeAll
    static void start() throws Exception {
        assumeTrue(System.getenv("DISPLAY") != null, "the workbench tests need a display; ./run-tests provides one");
        RuntimeCopy.into(home);
        copyDemo(home);
        runtime = FelixRuntime.start(home, Map.of("lamella.user.dir", user.toString(),
                "lamella.materials.facility", RuntimeCopy.assembled().resolve("demo/materials/fenwick-hall")
                        .toString(), "lamella.materials.user", userLibrary(user.resolve("materials")).toString()));
        context = runtime.framework().getBundleContext();
        window = openWindow();
    }

    @AfterAll
    static void stop() throws Exception {
        if (window != null) {
            closeWindow();
        }
        if (runtime != null) {
            runtime.close();
        }
    }

    @Test
    void everyRegisteredPanelIsShownAndPhotographed() throws Exception {
        List<String> registered = registeredPanelIds();
        assertTrue(registered.contains("messages") && registered.contains("project"), registered.toString());
        List<String> shown = lines(ask("placements")).stream().map(l -> l.split(" ")[0]).sorted().toList();
        assertEquals(registered.stream().sorted().toList(), shown);
        List<String> cut = new ArrayList<>();
        for (String size : List.of("1920 1080", "1280 800")) {
            ask("size " + size);
            for (String id : registered) {
                assertEquals("ok", ask("front " + id));
                Path png = SHOTS.resolve("panel-" + id + "-" + size.replace(' ', 'x') + ".png");
                ask("screenshot " + png);
                assertTrue(Files.size(png) > 10_000, png + " is too small to show a window");
                lines(ask("cut " + id)).forEach(l -> cut.add(size.replace(' ', 'x') + " " + id + ": " + l));
            }
        }
        ask("size 1600 1000");
        assertEquals(List.of(), cut, "every heading, label, button and chooser is readable in full");
    }

    @Test
    void theTitleNamesTheProjectAndTheStatusLineJudgesTheCase() {
        assertTrue(ask("title").matches("Lamella — [^ /]+\\.json in [^ /]+( \\(demo, read-only\\))?( •)?"),
                ask("title"));
        assertTrue(ask("status").startsWith("Case valid: gaussian heating"), ask("status"));
    }

    @Test
    void theViewMenuHidesAndShowsAPanel() throws Exception {
        assertTrue(lines(ask("view-menu")).contains("[x] Project"), ask("view-menu"));
        assertEquals("hidden", ask("toggle project"));
        assertTrue(lines(ask("view-menu")).contains("[ ] Project"), ask("view-menu"));
        assertTrue(lines(ask("placements")).stream().noneMatch(l -> l.startsWith("project ")));
        ask("screenshot " + SHOTS.resolve("project-hidden.png"));
        assertEquals("shown", ask("toggle project"));
        assertTrue(lines(ask("placements")).stream().anyMatch(l -> l.startsWith("project ")));
    }

    @Test
    void theSafetyNoticeCarriesTheLaserCaution() {
        String text = ask("safety");
        assertTrue(text.contains("Class 3B and Class 4 lasers"), text);
        assertTrue(text.contains("eye protection rated for every wavelength"), text);
        assertTrue(text.contains("interlocked enclosures"), text);
    }

    @Test
    void saveAsWritesACaseTheCaseReaderAccepts() throws Exception {
        Path target = user.resolve("saved/oxide-copy.json");
        assertEquals("saved", ask("save-as " + target));
        assertEquals("Lamella — oxide-copy.json in saved", ask("title"));
        try (Stream<Path> copied = Files.list(target.getParent())) {
            assertEquals(List.of("fdtr.csv", "oxide-copy.json", "tdtr-1.1mhz.csv", "tdtr-9.8mhz.csv"),
                    copied.map(p -> p.getFileName().toString()).sorted().toList(), "the data came along");
        }
        Object format = service("lamella.api.CaseFormat", null);
        Object doc = api(format, "lamella.api.CaseFormat").getMethod("read", Path.class).invoke(format, target);
        assertNotNull(doc);
        String text = Files.readString(target, StandardCharsets.UTF_8);
        assertTrue(text.contains("\"stack\""), text);
        assertTrue(Files.readString(user.resolve("recent.json")).contains("oxide-copy.json"));
    }

    @Test
    void helpHoldsTheUsersLoopAndTheKeysAndAboutNamesTheVersion() {
        String guide = ask("help User guide");
        for (String step : List.of("1. Stack", "Materials panel", "2. Set-up", "3. Import", "4. Datasets",
                "5. Sensitivity", "6. Fit", "7. Plan", "Map panel", "8. Report", "Laser and heater safety")) {
            assertTrue(guide.contains(step), step + " in: " + guide);
        }
        String keys = ask("help Keyboard shortcuts");
        assertTrue(keys.contains("Ctrl+Z") && keys.contains("Ctrl+Shift+Z, Ctrl+Y"), keys);
        // the menus show their keys beside their words, where a user learns them
        List<String> file = lines(ask("menu File"));
        for (String item : List.of("New from case…\tCtrl+N", "Open…\tCtrl+O", "Save\tCtrl+S",
                "Save as…\tCtrl+Shift+S", "Import data…\tCtrl+I", "Quit\tCtrl+Q")) {
            assertTrue(file.contains(item), item + " in " + file);
        }
        List<String> edit = lines(ask("menu Edit"));
        assertTrue(edit.get(0).startsWith("Undo") && edit.get(0).endsWith("\tCtrl+Z"), edit.toString());
        assertTrue(edit.get(1).startsWith("Redo") && edit.get(1).endsWith("\tCtrl+Shift+Z"), edit.toString());
        assertTrue(lines(ask("menu Help")).contains("User guide…\tF1"), ask("menu Help"));
        assertTrue(lines(ask("menu View")).stream().anyMatch(i -> i.endsWith("\tCtrl+M")), ask("menu View"));
        String about = ask("help About Lamella");
        String version = bundle("lamella.ui.workbench").getVersion().toString();
        assertTrue(about.contains("Lamella " + version), version + " in: " + about);
        assertTrue(about.contains("laser safety programme"), about);
        assertEquals("none", ask("dialog"), "each help window closed again");
    }

    @Test
    void theDemosOwnFolderIsNeverSavedInto() throws Exception {
        Path demoCase = home.resolve("demo/oxide-film-joint/case.json");
        String before = Files.readString(demoCase);
        assertEquals("error: not saved", window.apply("save-as " + demoCase));
        String notice = waitFor(() -> ask("dialog"), d -> d.startsWith("Not saved"));
        assertTrue(notice.contains("demo folder"), notice);
        ask("dialog-press OK");
        assertEquals(before, Files.readString(demoCase));
    }

    @Test
    void anArrangementSurvivesARestart() throws Exception {
        String signalArea = area(lines(ask("placements")), "signal");
        assertEquals("moved", ask("move project signal BOTTOM"));
        List<String> moved = lines(ask("placements"));
        // The signal area became a split: signal on top, project in a new area below it.
        assertEquals(signalArea + "/0", area(moved, "signal"), moved.toString());
        assertEquals(signalArea + "/1", area(moved, "project"), moved.toString());
        ask("screenshot " + SHOTS.resolve("arrangement-before-restart.png"));

        closeWindow();
        // The window's place is kept beside the arrangement, read before it when the window opens again.
        assertTrue(Files.readString(user.resolve("window.properties")).contains("maximised="));
        Bundle wb = bundle("lamella.ui.workbench");
        wb.stop();
        wb.start();
        window = openWindow();

        assertEquals(moved, lines(ask("placements")));
        ask("screenshot " + SHOTS.resolve("arrangement-after-restart.png"));
        assertTrue(Files.readString(user.resolve("arrangement.json")).contains("\"project\""));
    }

    @Test
    void removingALayerAsksFirstAndIsUndoneAndRedoneByMenuAndKeys() throws Exception {
        assertEquals("ok", ask("front stack"));
        int layers = lines(ask("table layer")).size() - 1;
        assertEquals("selected film", ask("table-select layer | 1"));
        ask("press Remove layer");
        String question = waitFor(() -> ask("dialog"), q -> q.contains("Remove layer 'film'"));
        assertTrue(question.contains("Undo"), question);
        ask("dialog-press Cancel");
        assertEquals(layers, lines(ask("table layer")).size() - 1, "cancelled: nothing removed");

        ask("press Remove layer");
        waitFor(() -> ask("dialog"), q -> q.contains("Remove layer 'film'"));
        ask("dialog-press Remove layer");
        assertEquals(layers - 1, lines(ask("table layer")).size() - 1);
        assertEquals("Undo remove layer 'film'", lines(ask("edit-menu")).get(0));
        assertTrue(ask("title").endsWith(" •"), ask("title"));
        for (String size : List.of("1280 800", "1920 1080")) {
            ask("size " + size);
            ask("screenshot " + SHOTS.resolve("layer-removed-" + size.replace(' ', 'x') + ".png"));
        }

        ask("key ctrl+z");
        waitFor(() -> ask("table layer"), t -> lines(t).size() - 1 == layers);
        assertTrue(lines(ask("table layer")).get(2).startsWith("film\t"), ask("table layer"));
        assertEquals("Redo remove layer 'film'", lines(ask("edit-menu")).get(1));
        ask("key ctrl+shift+z");
        waitFor(() -> ask("table layer"), t -> lines(t).size() - 1 == layers - 1);
        ask("undo");
        assertEquals(layers, lines(ask("table layer")).size() - 1);
        ask("key ctrl+y");
        waitFor(() -> ask("table layer"), t -> lines(t).size() - 1 == layers - 1);
        ask("undo");
        assertEquals(layers, lines(ask("table layer")).size() - 1);
        ask("size 1600 1000");
    }

    @Test
    void switchingTechniqueAwayAndBackKeepsItsSettings() throws Exception {
        assertEquals("ok", ask("front setup"));
        String tdtr = ask("fields Technique");
        assertTrue(tdtr.contains("modulation: = 9.8 MHz") && tdtr.contains("repetition: = 76 MHz"), tdtr);
        assertEquals("chosen fdtr", ask("choose Technique | fdtr"));
        assertTrue(!ask("fields Technique").contains("modulation"), ask("fields Technique"));
        ask("screenshot " + SHOTS.resolve("technique-fdtr.png"));
        assertEquals("chosen tdtr", ask("choose Technique | tdtr"));
        assertEquals(tdtr, ask("fields Technique"), "modulation and repetition came back");
        assertTrue(lines(ask("edit-menu")).get(0).startsWith("Undo switch the technique to tdtr"), ask("edit-menu"));
        ask("undo");
        ask("undo");
        assertEquals(tdtr, ask("fields Technique"));
    }

    @Test
    void theStatusLineSaysWhatIsMissingAndWhere() throws Exception {
        assertEquals("ok", ask("front setup"));
        assertEquals("chosen ring", ask("choose Heating geometry | ring"));
        String status = ask("status");
        assertTrue(status.startsWith("Case invalid at geometry.ring_radius_m: "), status);
        ask("size 1280 800");
        assertTrue(ask("cut status").lines().anyMatch(l -> l.equals("(unsaved changes)\twhole")),
                "beside a long problem the project's state stays readable: " + ask("cut status"));
        ask("size 1600 1000");
        ask("screenshot " + SHOTS.resolve("ring-without-radius.png"));
        ask("field Heating geometry | ring radius | 3");
        ask("field Heating geometry | ring width | 1");
        // The demo's fit block holds the gaussian pump radius as uncertain; the ring has none, so that role waits
        // with gaussian's values and the sensitivities are those of the ring's own inputs (13 of them).
        assertEquals("ok", ask("front sensitivity"));
        waitFor(() -> ask("texts sensitivity"), t -> t.contains("to 13 inputs"));
        assertTrue(ask("status").startsWith("Case valid: ring heating"), ask("status"));
        ask("screenshot " + SHOTS.resolve("ring-sensitivity.png"));
        ask("undo");
        ask("undo");
        ask("undo");
        assertTrue(ask("status").startsWith("Case valid: gaussian heating"), ask("status"));
    }

    @Test
    void aPanelMadeSmallKeepsItsTablesRoomOrIsNotShownAtAll() throws Exception {
        // GTK reports a scroll bar of negative size ("gtk_box_gadget_distribute: assertion 'size >= 0'") when a
        // table is squeezed below its header and a row or two; checked by hand under Xvfb with the sashes dragged.
        ask("size 1280 800");
        for (String[] drag : new String[][] {{"stack", "high"}, {"materials", "high"}, {"fit", "high"},
                {"signal", "wide"}, {"messages", "high"}}) {
            String id = drag[0];
            assertEquals("ok", ask("front " + id));
            String shut = ask("area-size " + id + " " + drag[1] + " 8");
            assertTrue(shut.endsWith("panel hidden"), "an area dragged almost shut shows nothing: " + shut);
            int had = Integer.parseInt(shut.split("[^0-9]+")[1]);
            String small = ask("area-size " + id + " " + drag[1] + " 250");
            assertTrue(small.contains("panel shown"), small);
            for (String h : small.replaceFirst(".*table heights ?", "").split(",")) {
                assertTrue(h.isEmpty() || Integer.parseInt(h) >= 90, id + ": a table squeezed: " + small);
            }
            ask("screenshot " + SHOTS.resolve("small-" + id + ".png"));
            assertTrue(ask("area-size " + id + " " + drag[1] + " " + had).contains("panel shown"));
        }
        ask("size 1600 1000");
    }

    @Test
    void anImportShowsWhatTheFileStatesAndAddsItToTheDatasetsOwnBlocks() throws Exception {
        Path raw = Files.createDirectories(user.resolve("incoming")).resolve("bench-scan.lamx");
        Files.copy(RuntimeCopy.assembled().resolve("demo/raw/oxide-film-tdtr.lamx"), raw,
                java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        assertEquals("ok", ask("front project"));
        Path caseFolder = Path.of(lines(ask("table Item")).stream().filter(l -> l.startsWith("Folder\t"))
                .findFirst().orElseThrow().split("\t")[1]);
        List<String> filesBefore = listing(caseFolder);
        long datasets = datasetRows().size();

        ask("import " + raw);
        String preview = waitFor(() -> ask("dialog"), d -> d.startsWith("Import data — bench-scan.lamx"));
        // The header of the demo file (invented data) states these; the case says 9.8 MHz.
        assertTrue(preview.contains("measurement · type tdtr from the file"), preview);
        assertTrue(preview.contains("measurement · modulation 9 MHz from the file"), preview);
        assertTrue(preview.contains("measurement · repetition 76 MHz from the file"), preview);
        assertTrue(preview.contains("geometry · pump radius 10 µm from the file"), preview);
        assertTrue(preview.contains("x: delay (delay_s)") && preview.contains("in_phase (V, with σ)"), preview);
        assertTrue(preview.contains("sample: FH-0417 oxide film (invented)"), preview);
        for (String size : List.of("1280 800", "1920 1080")) {
            ask("size " + size);
            ask("screenshot " + SHOTS.resolve("import-preview-" + size.replace(' ', 'x') + ".png"));
        }
        ask("dialog-press Cancel");
        assertEquals(datasets, datasetRows().size(), "cancelled: nothing added");

        ask("import " + raw);
        waitFor(() -> ask("dialog"), d -> d.startsWith("Import data — bench-scan.lamx"));
        ask("dialog-press Add dataset");
        List<String> rows = waitFor(() -> String.join("\n", datasetRows()),
                t -> lines(t).size() == datasets + 1).lines().toList();
        String added = rows.get(rows.size() - 1);
        assertTrue(added.contains("bench-scan.csv"), added);
        assertTrue(added.endsWith("measurement tdtr: modulation 9 MHz, repetition 76 MHz; geometry: the case's"),
                added);
        assertEquals(filesBefore, listing(caseFolder), "nothing is written into the case's folder before a save");
        assertEquals("Undo add dataset bench-scan.csv", lines(ask("edit-menu")).get(0));
        for (String size : List.of("1280 800", "1920 1080")) {
            ask("size " + size);
            ask("screenshot " + SHOTS.resolve("import-added-" + size.replace(' ', 'x') + ".png"));
        }
        ask("undo");
        assertEquals(datasets, datasetRows().size());
        ask("size 1600 1000");
    }

    @Test
    void aFitFlowsBackIntoTheSignalPanelAndTheCaseAndIsKeptWithTheProject() throws Exception {
        assertEquals("ok", ask("front fit"));
        ask("press Start fit");
        String fit = waitFor(() -> ask("texts fit"), t -> t.contains("Converged") || t.contains("Did not converge")
                || t.contains("failed"));
        assertTrue(fit.contains("Converged after"), fit);
        // The demo's joint fit: its reduced χ² is over every dataset, the signal panel's over the one shown.
        assertTrue(fit.matches("(?s).*reduced χ² \\S+ over all 3 datasets together.*"), fit);
        assertEquals("ok", ask("front signal"));
        String signal = waitFor(() -> ask("texts signal"), t -> t.contains("Dashed: the best fit of the last fit"));
        assertTrue(signal.contains("reduced χ² of this dataset alone"), signal);
        for (String size : List.of("1280 800", "1920 1080")) {
            ask("size " + size);
            ask("screenshot " + SHOTS.resolve("fit-best-fit-" + size.replace(' ', 'x') + ".png"));
        }
        assertEquals("ok", ask("front stack"));
        String before = ask("table layer");
        assertEquals("ok", ask("front fit"));
        ask("press Use fitted values");
        waitFor(() -> lines(ask("edit-menu")).get(0), u -> u.equals("Undo use fitted values"));
        assertTrue(ask("texts fit").contains("The case holds the fitted values now"), ask("texts fit"));
        assertEquals("ok", ask("front stack"));
        String after = ask("table layer");
        assertTrue(!after.equals(before), "the stack shows the fitted values: " + after);
        assertEquals("ok", ask("front signal"));
        assertTrue(waitFor(() -> ask("texts signal"), t -> t.contains("Dashed: the best fit")).contains(signal
                .lines().filter(l -> l.contains("Dashed")).findFirst().orElseThrow().split("Dashed")[1]));
        ask("undo");
        assertEquals("ok", ask("front stack"));
        assertEquals(before, ask("table layer"), "undone: the starting values are back");

        assertEquals("ok", ask("front setup"));
        ask("field Technique | modulation | 9.7 MHz");
        assertEquals("ok", ask("front fit"));
        assertTrue(waitFor(() -> ask("texts fit"), t -> t.contains("Out of date")).contains("Start fit again"));
        assertEquals("ok", ask("front signal"));
        waitFor(() -> ask("texts signal"), t -> t.contains("out of date since the case was edited"));
        ask("screenshot " + SHOTS.resolve("fit-out-of-date.png"));
        ask("undo");
        assertEquals("ok", ask("front fit"));
        assertTrue(!ask("texts fit").contains("Out of date"), ask("texts fit"));

        Path kept = user.resolve("fitted/sample.json");
        assertEquals("saved", ask("save-as " + kept));
        assertTrue(Files.readString(kept).contains("\"last_fit\""), "the fit is kept in the case file");
        Object format = service("lamella.api.CaseFormat", null);
        api(format, "lamella.api.CaseFormat").getMethod("read", Path.class).invoke(format, kept);
        assertEquals("opened", ask("open " + kept));
        assertEquals("ok", ask("front fit"));
        String reopened = waitFor(() -> ask("texts fit"), t -> t.contains("The last fit, kept with the project"));
        assertTrue(reopened.contains("Converged after"), reopened);
        assertEquals("ok", ask("front signal"));
        waitFor(() -> ask("texts signal"), t -> t.contains("Dashed: the best fit of the last fit"));
        ask("screenshot " + SHOTS.resolve("fit-reopened.png"));
        ask("size 1600 1000");
    }

    @Test
    void theDatasetsPanelShowsEachDatasetsOwnSettingsRowsAndSigmaSource() throws Exception {
        assertEquals("ok", ask("front datasets"));
        String table = waitFor(() -> ask("table Fitted x range"), t -> lines(t).size() == 4 && !t.contains("…"));
        List<String> rows = lines(table);
        assertEquals("Dataset\tData file\tTechnique\tSignal\tPoints\tFitted x range\tLeft out\tσ from",
                rows.get(0));
        assertTrue(rows.get(1).startsWith("0\ttdtr-9.8mhz.csv\ttdtr\tratio\t40\tall: 100 ps to 4 ns\tnone"),
                rows.get(1));
        assertTrue(rows.get(3).startsWith("2\tfdtr.csv\tfdtr\tphase_deg\t"), rows.get(3));
        assertEquals("selected 2", ask("table-select Fitted x range | 2"));
        String geometry = ask("fields Heating geometry of dataset 2 · fdtr.csv");
        assertTrue(geometry.contains("pump radius: = 3.2 µm"), geometry);
        for (String size : List.of("1280 800", "1920 1080")) {
            ask("size " + size);
            ask("screenshot " + SHOTS.resolve("datasets-" + size.replace(' ', 'x') + ".png"));
        }
        assertEquals("selected 0", ask("table-select Fitted x range | 0"));
        ask("field Fitted points of dataset 0 · tdtr-9.8mhz.csv | fit from | 200 ps");
        assertEquals("Undo set the fitted x range of dataset 0", lines(ask("edit-menu")).get(0));
        waitFor(() -> ask("table Fitted x range"), t -> lines(t).get(1).contains("\t200 ps to 4 ns\t"));
        ask("undo");
        waitFor(() -> ask("table Fitted x range"), t -> lines(t).get(1).contains("\tall: 100 ps to 4 ns\t"));
        ask("size 1600 1000");
    }

    @Test
    void theMaterialsPanelAndTheStacksPickerFindTheShippedFacilityAndUserLibraries() throws Exception {
        assertEquals("ok", ask("front materials"));
        assertEquals("silicon", ask("search materials | silicon"));
        List<String> found = lines(ask("table library (tier)"));
        assertTrue(found.stream().anyMatch(r -> r.startsWith("silicon\t") && r.contains("shipped")),
                found + "\n" + ask("texts materials") + "\n" + ask("messages"));
        assertTrue(found.stream().anyMatch(r -> r.startsWith("fh-pecvd-oxide\t") && r.contains("facility")),
                found.toString());
        assertTrue(found.stream().anyMatch(r -> r.startsWith("bench-a-si\t") && r.contains("user")),
                found.toString());
        for (String size : List.of("1280 800", "1920 1080")) {
            ask("size " + size);
            ask("screenshot " + SHOTS.resolve("materials-silicon-" + size.replace(' ', 'x') + ".png"));
        }
        ask("search materials | ");

        assertEquals("ok", ask("front stack"));
        List<String> layers = lines(ask("table layer"));
        assertTrue(layers.get(3).startsWith("substrate\t"), layers.toString());
        ask("cell-click layer | 2 | material");
        ask("screenshot " + SHOTS.resolve("stack-material-picker.png"));
        assertEquals("chosen silicon — ", ask("editor-choose silicon — ").substring(0, "chosen silicon — ".length()));
        String picked = waitFor(() -> ask("table layer"), t -> lines(t).get(3).startsWith("substrate\tsilicon\t"));
        assertTrue(lines(picked).get(3).contains("(material)"), "the library's values are shown: " + picked);
        assertTrue(lines(ask("edit-menu")).get(0).contains("silicon"), ask("edit-menu"));
        ask("screenshot " + SHOTS.resolve("stack-material-picked.png"));
        ask("undo");
        waitFor(() -> ask("table layer"), t -> lines(t).get(3).startsWith("substrate\t(own values)\t"));
        ask("size 1600 1000");
    }

    @Test
    void theWorkbenchPaintsQuickly() {
        String ms = ask("first-paint-ms");
        System.out.println("workbench: first paint " + ms + " ms after the display was created");
        assertTrue(Long.parseLong(ms) < 10_000, ms);
    }

    // ------------------------------------------------------------------ helpers

    /** Asks until the answer passes the check; the last answer otherwise fails the test. */
    private static String waitFor(java.util.function.Supplier<String> question, java.util.function.Predicate<String> ok)
            throws InterruptedException {
        long deadline = System.nanoTime() + TimeUnit.MILLISECONDS.toNanos(PATIENCE_MS);
        String answer = question.get();
        while (!ok.test(answer) && System.nanoTime() < deadline) {
            Thread.sleep(50);
            answer = question.get();
        }
        assertTrue(ok.test(answer), answer);
        return answer;
    }

    /** A user's own library of one entry; its values are invented for this test and checked only as shown. */
    private static Path userLibrary(Path folder) throws IOException {
        Files.createDirectories(folder);
        Files.writeString(folder.resolve("library.json"), """
                {"library_format": 1, "id": "bench-notes", "name": "A user's own films (invented for a test)",
                 "maintainer": "the test", "description": "Invented for a workbench test."}
                """);
        Files.writeString(folder.resolve("films.json"), """
                {"materials": [{"id": "bench-a-si", "name": "Amorphous silicon film, e-beam (invented)",
                  "version": 1, "source": "Invented for a workbench test; not a measurement",
                  "properties": {"k_w_mk": {"value": 1.8, "range_k": [290, 310]},
                                 "heat_capacity_j_m3k": {"value": 1.6e6, "range_k": [290, 310]}}}]}
                """);
        return folder;
    }

    private static List<String> datasetRows() {
        return lines(ask("table Item")).stream().filter(l -> l.startsWith("Dataset ")).toList();
    }

    private static List<String> listing(Path folder) throws IOException {
        try (Stream<Path> files = Files.list(folder)) {
            return files.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    private static String area(List<String> placements, String id) {
        return placements.stream().filter(l -> l.startsWith(id + " ")).map(l -> l.split(" ")[1]).findFirst()
                .orElseThrow(() -> new AssertionError(id + " not in " + placements));
    }

    private static String ask(String command) {
        String answer = window.apply(command);
        if (answer.startsWith("error:")) {
            throw new AssertionError(command + " → " + answer);
        }
        return answer;
    }

    private static List<String> lines(String text) {
        return text.isEmpty() ? List.of() : Arrays.asList(text.split("\n"));
    }

    @SuppressWarnings("unchecked")
    private static Function<String, String> openWindow() throws Exception {
        Runnable workbench = (Runnable) service("java.lang.Runnable", "(lamella.role=workbench)");
        uiFailure.set(null);
        ui = new Thread(() -> {
            try {
                workbench.run();
            } catch (Throwable t) {
                uiFailure.set(t);
            }
        }, "workbench-ui");
        ui.start();
        return (Function<String, String>) service("java.util.function.Function", "(lamella.role=workbench.control)");
    }

    private static void closeWindow() throws InterruptedException {
        assertEquals("closed", window.apply("close"));
        ui.join(TimeUnit.SECONDS.toMillis(10));
        assertTrue(!ui.isAlive(), "the UI thread ended when the window closed");
        if (uiFailure.get() != null) {
            throw new AssertionError("the workbench failed", uiFailure.get());
        }
        window = null;
    }

    private static Object service(String type, String filter) throws Exception {
        long deadline = System.nanoTime() + TimeUnit.MILLISECONDS.toNanos(PATIENCE_MS);
        while (System.nanoTime() < deadline) {
            if (uiFailure.get() != null) {
                throw new AssertionError("the workbench failed", uiFailure.get());
            }
            ServiceReference<?>[] refs = context.getServiceReferences(type, filter);
            if (refs != null && refs.length > 0) {
                return context.getService(refs[0]);
            }
            Thread.sleep(20);
        }
        throw new AssertionError("no " + type + " " + filter + " within " + PATIENCE_MS + " ms");
    }

    private static List<String> registeredPanelIds() throws Exception {
        List<String> ids = new ArrayList<>();
        ServiceReference<?>[] refs = context.getServiceReferences("lamella.ui.api.WorkbenchPanel", null);
        for (ServiceReference<?> r : refs) {
            Object panel = context.getService(r);
            ids.add((String) api(panel, "lamella.ui.api.WorkbenchPanel").getMethod("id").invoke(panel));
            context.ungetService(r);
        }
        return ids;
    }

    /** The API interface as the service's own bundle sees it; the API is not on this test's class path. */
    private static Class<?> api(Object service, String name) throws ClassNotFoundException {
        return Class.forName(name, false, service.getClass().getClassLoader());
    }

    private static Bundle bundle(String name) {
        return Stream.of(context.getBundles()).filter(b -> name.equals(b.getSymbolicName())).findFirst()
                .orElseThrow(() -> new AssertionError("no bundle " + name));
    }

    private static void copyDemo(Path target) throws IOException {
        Path demo = RuntimeCopy.assembled().resolve("demo/oxide-film-joint");
        Path to = Files.createDirectories(target.resolve("demo/oxide-film-joint"));
        try (Stream<Path> files = Files.list(demo)) {
            for (Path f : files.toList()) {
                Files.copy(f, to.resolve(f.getFileName().toString()));
            }
        }
    }
}
