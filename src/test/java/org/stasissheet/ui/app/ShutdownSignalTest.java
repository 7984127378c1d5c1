package org.stasissheet.ui.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * SIGTERM to a running form: the form runs in a child JVM on headless Monocle ({@link ShutdownChild}) and is stopped
 * with {@link ProcessHandle#destroy()} (SIGTERM on Linux and macOS), as a logout or {@code kill} would.
 */
class ShutdownSignalTest {
    @TempDir
    Path data;

    @Test
    @DisplayName("SIGTERM with a job in flight: the draft holds the last edit and no stack trace is printed")
    void sigtermSavesTheDraft() throws Exception {
        String label = "Invented bed 9, signal test";
        Path err = data.resolve("child-stderr.txt");
        Path folder = Files.createDirectories(data.resolve("form-data"));
        List<String> cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", System.getProperty("java.class.path"), "-Xss4m",
                "-Dglass.platform=Monocle", "-Dmonocle.platform=Headless", "-Dprism.order=sw", "-Dprism.text=t2k",
                "-Dtestfx.headless=true", "-Djava.awt.headless=true",
                ShutdownChild.class.getName(), folder.toString(), label));
        Process child = new ProcessBuilder(cmd).redirectError(err.toFile()).start();
        try {
            CompletableFuture<Boolean> ready = CompletableFuture.supplyAsync(() -> {
                try (BufferedReader r = new BufferedReader(new InputStreamReader(child.getInputStream(),
                        StandardCharsets.UTF_8))) {
                    String line;
                    while ((line = r.readLine()) != null) {
                        if (line.equals("READY")) {
                            return true;
                        }
                    }
                    return false;
                } catch (java.io.IOException e) {
                    return false;
                }
            });
            assertTrue(ready.get(120, TimeUnit.SECONDS), "the child form started: " + Files.readString(err));
            Thread.sleep(500); // let the edit's listeners settle
            assertTrue(child.toHandle().destroy(), "SIGTERM sent");
            assertTrue(child.waitFor(60, TimeUnit.SECONDS), "the form ended after SIGTERM");
        } finally {
            child.destroyForcibly();
        }
        List<Path> drafts;
        try (var files = Files.list(folder)) {
            drafts = files.filter(p -> p.getFileName().toString().startsWith("draft-")).toList();
        }
        assertEquals(1, drafts.size(), "one draft: " + drafts);
        assertTrue(Files.readString(drafts.get(0)).contains(label), "the last edit is in the draft");
        String printed = Files.readString(err);
        assertFalse(printed.contains("Exception"), printed);
        assertFalse(printed.contains("\tat "), printed);
        // and the next start offers it
        assertEquals(1, new org.stasissheet.ui.draft.DraftStore(folder).crashedDrafts().size());
    }
}
