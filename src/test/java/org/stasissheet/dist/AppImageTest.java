package org.stasissheet.dist;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * The installable application (built by {@code mvn -Pdist package}, which also runs this check itself) runs the
 * demo cases exactly as the jar does, with no system JDK on its path. Building the image takes minutes, so a plain
 * {@code mvn verify} does not build it: without an image, or with an image made from another build of the jar
 * (an older one would rightly print something else), this test is skipped, and says so.
 */
class AppImageTest {
    private static final Path IMAGE = Path.of("target/dist/stasis-sheet/bin/stasis-sheet");
    private static final Path JAR = Path.of("target/stasis-sheet.jar");
    private static final Path IMAGE_JAR = Path.of("target/dist/stasis-sheet/lib/app/stasis-sheet.jar");

    @Test
    @DisplayName("the application image prints for every demo case what the jar prints, without a system JDK")
    void imageRunsTheSamplesLikeTheJar() throws IOException, InterruptedException {
        assumeTrue(Files.isExecutable(IMAGE) && Files.isRegularFile(JAR),
                "no application image: build it with mvn -Pdist package");
        assumeTrue(java.util.Arrays.equals(Files.readAllBytes(JAR), Files.readAllBytes(IMAGE_JAR)),
                "the application image was built from another build of the jar: run mvn -Pdist package");
        Process check = new ProcessBuilder("sh", "src/dist/check-app-image.sh").redirectErrorStream(true).start();
        String output = new String(check.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assumeTrue(check.waitFor(5, TimeUnit.MINUTES), "the check did not finish");
        assertEquals(0, check.exitValue(), output);
    }
}
