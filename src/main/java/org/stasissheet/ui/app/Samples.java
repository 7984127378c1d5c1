package org.stasissheet.ui.app;

import java.io.IOException;
import java.io.InputStream;
import java.util.List;
import java.util.Optional;

/** The demo cases packaged with the program (the repository's {@code samples/} folder). */
public final class Samples {
    /** Where the build puts them on the class path. */
    public static final String FOLDER = "org/stasissheet/samples/";
    /** Their file names, in menu order. */
    public static final List<String> NAMES = List.of("igm-symptomatic.json", "iga-borderline.json",
            "aml-breathless.json", "cll-extreme.json");

    private Samples() {
    }

    /** The bytes of a packaged sample (small: read on the JavaFX thread). */
    public static Optional<byte[]> read(String name) {
        try (InputStream in = Samples.class.getClassLoader().getResourceAsStream(FOLDER + name)) {
            return in == null ? Optional.empty() : Optional.of(in.readAllBytes());
        } catch (IOException e) {
            return Optional.empty();
        }
    }
}
