package org.stasissheet;

import static org.junit.jupiter.api.Assertions.*;

import java.io.IOException;
import java.lang.reflect.Member;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** Keeps {@code src/site/hazard-log.md} true: every hazard has a control, a place and tests that exist. */
class HazardLogTest {
    private static final Path LOG = Path.of("src/site/hazard-log.md");
    private static final Pattern TEST = Pattern.compile("`([A-Z][A-Za-z0-9]*(?:\\.[A-Z][A-Za-z0-9]*)*)#([A-Za-z_][A-Za-z0-9_]*)`");
    private static final Pattern SOURCE = Pattern.compile("`([a-z][A-Za-z0-9/._-]*\\.(?:java|yaml))`");

    record Row(String id, String hazard, String cause, String control, String where, String tests) {
    }

    static List<Row> rows() throws IOException {
        List<Row> rows = new ArrayList<>();
        for (String line : Files.readAllLines(LOG, StandardCharsets.UTF_8)) {
            if (!line.startsWith("| H")) {
                continue;
            }
            String[] cells = line.substring(1, line.length() - 1).split(" \\| ", -1);
            assertEquals(6, cells.length, "a hazard row has six cells: " + line);
            rows.add(new Row(cells[0].trim(), cells[1].trim(), cells[2].trim(), cells[3].trim(), cells[4].trim(),
                    cells[5].trim()));
        }
        return rows;
    }

    @Test
    @DisplayName("at least 15 hazards, each with a cause, a control, a place and at least one test")
    void everyHazardIsControlled() throws IOException {
        List<Row> rows = rows();
        assertTrue(rows.size() >= 15, "hazards: " + rows.size());
        for (Row r : rows) {
            assertFalse(r.hazard().isBlank() || r.cause().isBlank() || r.control().isBlank() || r.where().isBlank(),
                    r.id());
            assertTrue(TEST.matcher(r.tests()).find(), r.id() + " names no test");
        }
        assertEquals(rows.size(), rows.stream().map(Row::id).distinct().count(), "hazard ids are unique");
    }

    @Test
    @DisplayName("every test the log names exists (class and method or field)")
    void namedTestsExist() throws IOException {
        List<String> missing = new ArrayList<>();
        for (Row r : rows()) {
            Matcher m = TEST.matcher(r.tests());
            while (m.find()) {
                String className = m.group(1);
                String member = m.group(2);
                Optional<Class<?>> type = testClass(className);
                boolean found = type.map(t -> members(t).anyMatch(member::equals)).orElse(false);
                if (!found) {
                    missing.add(r.id() + ": " + className + "#" + member);
                }
            }
        }
        assertEquals(List.of(), missing, "tests named in the hazard log that do not exist");
    }

    @Test
    @DisplayName("every source file the log names as the place of a control exists")
    void namedPlacesExist() throws IOException {
        List<String> missing = new ArrayList<>();
        for (Row r : rows()) {
            Matcher m = SOURCE.matcher(r.where());
            while (m.find()) {
                String path = m.group(1);
                if (path.contains("*")) {
                    continue;
                }
                Path p = path.endsWith(".yaml") ? Path.of(path) : Path.of("src/main/java/org/stasissheet", path);
                if (!Files.exists(p)) {
                    missing.add(r.id() + ": " + path);
                }
            }
        }
        assertEquals(List.of(), missing);
    }

    /** The methods and fields of a test class and of its nested test classes (JUnit's {@code @Nested}). */
    private static Stream<String> members(Class<?> type) {
        return Stream.concat(Stream.concat(Arrays.stream(type.getDeclaredMethods()),
                        Arrays.stream(type.getDeclaredFields())).map(Member::getName),
                Arrays.stream(type.getDeclaredClasses()).flatMap(HazardLogTest::members));
    }

    /** A test class by its simple name ({@code Outer.Inner} for a nested class), found under src/test/java. */
    private static Optional<Class<?>> testClass(String dotted) throws IOException {
        String[] parts = dotted.split("\\.");
        try (Stream<Path> files = Files.walk(Path.of("src/test/java"))) {
            Optional<Path> file = files.filter(p -> p.getFileName().toString().equals(parts[0] + ".java")).findFirst();
            if (file.isEmpty()) {
                return Optional.empty();
            }
            String fqn = Path.of("src/test/java").relativize(file.get()).toString()
                    .replace(java.io.File.separatorChar, '.').replaceAll("\\.java$", "");
            for (int i = 1; i < parts.length; i++) {
                fqn += "$" + parts[i];
            }
            try {
                return Optional.of(Class.forName(fqn));
            } catch (ClassNotFoundException e) {
                return Optional.empty();
            }
        }
    }
}
