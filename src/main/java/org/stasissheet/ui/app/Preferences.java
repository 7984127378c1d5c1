package org.stasissheet.ui.app;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.stasissheet.ui.entry.UnitSystem;

/**
 * The user's settings, kept between sessions: the starting units for new entries, the recently used case files
 * (most recent first, at most {@link #MAX_RECENT}), the rule folder of a local protocol (empty: the shipped set),
 * the high-contrast look, the text size factor (1 = the system font size), the assessor a new case starts
 * with (empty: none; one line, at most {@link #MAX_ASSESSOR} characters) and the folder of the last export.
 */
public record Preferences(UnitSystem units, List<Path> recentFiles, Optional<Path> ruleFolder, boolean highContrast,
                          double textScale, String assessor, Optional<Path> exportFolder) {
    public static final int MAX_ASSESSOR = 120;
    public static final int MAX_RECENT = 8;
    public static final double MIN_SCALE = 0.8;
    public static final double MAX_SCALE = 2.5;
    public static final Preferences DEFAULTS = new Preferences(UnitSystem.SI, List.of(), Optional.empty(), false, 1,
            "", Optional.empty());

    public Preferences {
        Objects.requireNonNull(units, "units");
        recentFiles = List.copyOf(recentFiles.stream().limit(MAX_RECENT).toList());
        Objects.requireNonNull(ruleFolder, "ruleFolder");
        if (!(textScale >= MIN_SCALE && textScale <= MAX_SCALE)) {
            throw new IllegalArgumentException("textScale must be " + MIN_SCALE + "–" + MAX_SCALE + ": " + textScale);
        }
        Objects.requireNonNull(assessor, "assessor");
        if (assessor.length() > MAX_ASSESSOR || assessor.chars().anyMatch(Character::isISOControl)) {
            throw new IllegalArgumentException("assessor must be one line of at most " + MAX_ASSESSOR + " characters");
        }
    }

    public Preferences withUnits(UnitSystem u) {
        return new Preferences(u, recentFiles, ruleFolder, highContrast, textScale, assessor, exportFolder);
    }

    /** Moves (or adds) the file to the top of the recent list. */
    public Preferences withRecent(Path file) {
        Path abs = file.toAbsolutePath().normalize();
        List<Path> list = new ArrayList<>();
        list.add(abs);
        recentFiles.stream().filter(p -> !p.equals(abs)).forEach(list::add);
        return new Preferences(units, list, ruleFolder, highContrast, textScale, assessor, exportFolder);
    }

    public Preferences withRuleFolder(Optional<Path> folder) {
        return new Preferences(units, recentFiles, folder, highContrast, textScale, assessor, exportFolder);
    }

    public Preferences withHighContrast(boolean on) {
        return new Preferences(units, recentFiles, ruleFolder, on, textScale, assessor, exportFolder);
    }

    public Preferences withTextScale(double scale) {
        return new Preferences(units, recentFiles, ruleFolder, highContrast,
                Math.max(MIN_SCALE, Math.min(MAX_SCALE, scale)), assessor, exportFolder);
    }

    /** The assessor a new case starts with, on one line and cut to {@link #MAX_ASSESSOR} characters. */
    public Preferences withAssessor(String name) {
        String line = name.replaceAll("[\\p{Cntrl}\\x{80}-\\x{9F}]+", " ").strip();
        return new Preferences(units, recentFiles, ruleFolder, highContrast, textScale,
                line.length() > MAX_ASSESSOR ? line.substring(0, MAX_ASSESSOR) : line, exportFolder);
    }

    /** The folder the next export is suggested in (the folder of the last one). */
    public Preferences withExportFolder(Optional<Path> folder) {
        return new Preferences(units, recentFiles, ruleFolder, highContrast, textScale, assessor,
                folder.map(f -> f.toAbsolutePath().normalize()));
    }
}
