package org.stasissheet.files;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
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

    /** The compact form of the shipped set, written by the build ({@link ShippedRulesCompactor}) beside the YAML. */
    public static final String COMPACT = "rules.compact.json";

    /**
     * The shipped rule set, validated (it should always load; a refusal means a broken build). It is read from the
     * compact form the build made from the same YAML files, which starts several times faster; classes built
     * without that step (an IDE's own compiler) fall back to the YAML copy.
     */
    public static LoadResult shipped() {
        Optional<byte[]> compact = resource(COMPACT);
        if (compact.isPresent()) {
            return RuleSetLoader.loadCompact(compact.get());
        }
        return shippedFromYaml();
    }

    /** The shipped set read from its YAML copy, as a local folder is read; tests compare it with {@link #shipped}. */
    public static LoadResult shippedFromYaml() {
        Map<String, byte[]> files = shippedFiles();
        return RuleSetLoader.load(files, Optional.of(RuleSetLoader.sha256(files)));
    }

    /** A rule folder, validated and compared with the shipped set. An unreadable folder is a refusal too. */
    public static LoadResult folder(Path dir) {
        FolderFiles read;
        try {
            read = readFolder(dir);
        } catch (IOException | UncheckedIOException e) {
            return new LoadResult.Refused(List.of(new RuleProblem(dir.toString(), 0, 0,
                    "cannot read the rule folder: " + e.getMessage())));
        }
        if (!read.problems().isEmpty()) {
            return new LoadResult.Refused(read.problems());
        }
        return RuleSetLoader.load(read.files(), Optional.of(shippedSha256()));
    }

    /** The SHA-256 of the shipped set's YAML files: as the build recorded it in the compact form, else computed. */
    public static String shippedSha256() {
        return resource(COMPACT).map(RuleSetLoader::compactSha256)
                .orElseGet(() -> RuleSetLoader.sha256(shippedFiles()));
    }

    /** What a folder held: the files read, and the entries refused without being read. */
    public record FolderFiles(Map<String, byte[]> files, List<RuleProblem> problems) {
    }

    /**
     * Every {@code .yaml}/{@code .yml} file under {@code dir}, by relative path with '/' separators. A file that
     * is not a regular file (a FIFO would block forever) or a link leading outside the folder is refused before
     * it is opened; each file is read through a stream that stops one byte past {@link RuleSetLoader#MAX_FILE_BYTES},
     * and no more than {@link RuleSetLoader#MAX_FILES} files are read.
     */
    public static FolderFiles readFolder(Path dir) throws IOException {
        if (!Files.isDirectory(dir)) {
            throw new IOException(dir + " is not a folder");
        }
        Path root = dir.toRealPath();
        Map<String, byte[]> files = new TreeMap<>();
        List<RuleProblem> problems = new ArrayList<>();
        List<Path> entries;
        try (Stream<Path> walk = Files.walk(dir)) {
            entries = walk.filter(p -> isYaml(p.getFileName().toString())).sorted().toList();
        }
        for (Path p : entries) {
            String rel = dir.relativize(p).toString().replace('\\', '/');
            Optional<String> refusal = refusal(root, p);
            if (refusal.isPresent()) {
                problems.add(new RuleProblem(rel, 0, 0, refusal.get() + "; it was not read"));
                continue;
            }
            if (files.size() >= RuleSetLoader.MAX_FILES) {
                problems.add(new RuleProblem(rel, 0, 0, "more than " + RuleSetLoader.MAX_FILES
                        + " YAML files in the rule folder; the rest were not read"));
                break;
            }
            try (InputStream in = Files.newInputStream(p)) {
                byte[] bytes = in.readNBytes(RuleSetLoader.MAX_FILE_BYTES + 1);
                if (bytes.length > RuleSetLoader.MAX_FILE_BYTES) {
                    problems.add(new RuleProblem(rel, 0, 0, "larger than " + RuleSetLoader.MAX_FILE_BYTES
                            + " bytes (1 MiB), the most a rule file may be; it was not read further"));
                } else {
                    files.put(rel, bytes);
                }
            }
        }
        return new FolderFiles(files, problems);
    }

    private static boolean isYaml(String name) {
        return name.endsWith(".yaml") || name.endsWith(".yml");
    }

    /** Why an entry must not be opened, checked on the entry itself and, for a link, on where it leads. */
    private static Optional<String> refusal(Path root, Path p) throws IOException {
        if (Files.isSymbolicLink(p)) {
            Path target;
            try {
                target = p.toRealPath();
            } catch (IOException e) {
                return Optional.of("a link that leads nowhere (or round in a loop)");
            }
            if (!target.startsWith(root)) {
                return Optional.of("a link leading outside the rule folder");
            }
        }
        if (Files.isDirectory(p)) {
            return Optional.of("a folder with a rule-file name");
        }
        if (!Files.isRegularFile(p)) {
            return Optional.of("not a regular file (a pipe, device or socket)");
        }
        return Optional.empty();
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
        List<String> out = new ArrayList<>();
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
