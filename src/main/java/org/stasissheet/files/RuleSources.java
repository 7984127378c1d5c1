package org.stasissheet.files;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import java.util.stream.Stream;
import org.stasissheet.rules.LoadResult;
import org.stasissheet.rules.RuleProblem;
import org.stasissheet.rules.RuleSetLoader;

/**
 * Reads rule files into the map {@link RuleSetLoader} validates: from a folder on disk (a local protocol), or
 * from the copy shipped inside the jar. A jar folder cannot be listed, so the shipped copy is read by following
 * the manifest's {@code files} list.
 */
public final class RuleSources {
    /** Where the pom copies the top-level {@code rules/} folder inside the jar. */
    public static final String SHIPPED_ROOT = "org/stasissheet/rules/shipped/";

    private RuleSources() {
    }

    /** The shipped rule set, validated (it should always load; a refusal means a broken build). */
    public static LoadResult shipped() {
        Map<String, byte[]> files = shippedFiles();
        return RuleSetLoader.load(files, Optional.of(RuleSetLoader.sha256(files)));
    }

    /** A rule folder, validated and compared with the shipped set. An unreadable folder is a refusal too. */
    public static LoadResult folder(Path dir) {
        Map<String, byte[]> files;
        try {
            files = readFolder(dir);
        } catch (IOException | UncheckedIOException e) {
            return new LoadResult.Refused(List.of(new RuleProblem(dir.toString(), 0, 0,
                    "cannot read the rule folder: " + e.getMessage())));
        }
        return RuleSetLoader.load(files, Optional.of(shippedSha256()));
    }

    /** The SHA-256 of the shipped set, computed from the copy on the class path. */
    public static String shippedSha256() {
        return RuleSetLoader.sha256(shippedFiles());
    }

    /** Every {@code .yaml}/{@code .yml} file under {@code dir}, by relative path with '/' separators. */
    public static Map<String, byte[]> readFolder(Path dir) throws IOException {
        if (!Files.isDirectory(dir)) {
            throw new IOException(dir + " is not a folder");
        }
        Map<String, byte[]> files = new TreeMap<>();
        try (Stream<Path> walk = Files.walk(dir)) {
            for (Path p : walk.filter(Files::isRegularFile).toList()) {
                String name = p.getFileName().toString();
                if (name.endsWith(".yaml") || name.endsWith(".yml")) {
                    String rel = dir.relativize(p).toString().replace('\\', '/');
                    files.put(rel, Files.readAllBytes(p));
                }
            }
        }
        return files;
    }

    /** The shipped files: the manifest and every file it lists (lines under {@code files:} starting "- "). */
    public static Map<String, byte[]> shippedFiles() {
        Map<String, byte[]> files = new TreeMap<>();
        byte[] manifest = resource(RuleSetLoader.MANIFEST)
                .orElseThrow(() -> new IllegalStateException("the shipped rule set is missing from the class path"));
        files.put(RuleSetLoader.MANIFEST, manifest);
        for (String path : listedIn(new String(manifest, StandardCharsets.UTF_8))) {
            resource(path).ifPresent(bytes -> files.put(path, bytes));
        }
        return files;
    }

    /** The paths under the manifest's top-level {@code files:} key; the loader re-checks them properly. */
    static List<String> listedIn(String manifest) {
        List<String> out = new java.util.ArrayList<>();
        boolean inFiles = false;
        for (String line : manifest.split("\n", -1)) {
            String trimmed = line.strip();
            if (trimmed.startsWith("#") || trimmed.isEmpty()) {
                continue;
            }
            if (!line.startsWith(" ") && !line.startsWith("-")) {
                inFiles = line.startsWith("files:");
                continue;
            }
            if (inFiles && trimmed.startsWith("- ")) {
                out.add(unquote(trimmed.substring(2).strip()));
            }
        }
        return out;
    }

    private static String unquote(String s) {
        int hash = s.indexOf(" #");
        String v = hash >= 0 ? s.substring(0, hash).strip() : s;
        if (v.length() >= 2 && (v.startsWith("\"") && v.endsWith("\"") || v.startsWith("'") && v.endsWith("'"))) {
            return v.substring(1, v.length() - 1);
        }
        return v;
    }

    private static Optional<byte[]> resource(String relative) {
        try (InputStream in = RuleSources.class.getClassLoader().getResourceAsStream(SHIPPED_ROOT + relative)) {
            return in == null ? Optional.empty() : Optional.of(in.readAllBytes());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
