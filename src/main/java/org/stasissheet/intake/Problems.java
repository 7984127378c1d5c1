package org.stasissheet.intake;

import java.util.ArrayList;
import java.util.List;

/** Collects the problems of one read, in the order found. Paths are dotted; the empty path is the whole file. */
final class Problems {
    private final List<CaseReader.Problem> found = new ArrayList<>();
    private int unlisted;

    /** Keeps at most {@link CaseReader#MAX_PROBLEMS}, each cut to {@link CaseReader#MAX_MESSAGE_CHARS}. */
    void add(String path, String message) {
        if (found.size() >= CaseReader.MAX_PROBLEMS) {
            unlisted++;
            return;
        }
        found.add(new CaseReader.Problem(path.isEmpty() ? CaseReader.Problem.WHOLE_FILE : cut(path), cut(message)));
    }

    private static String cut(String s) {
        return s.length() <= CaseReader.MAX_MESSAGE_CHARS ? s : s.substring(0, CaseReader.MAX_MESSAGE_CHARS) + "…";
    }

    int count() {
        return found.size() + unlisted;
    }

    boolean isEmpty() {
        return found.isEmpty();
    }

    List<CaseReader.Problem> list() {
        List<CaseReader.Problem> all = new ArrayList<>(found);
        if (unlisted > 0) {
            all.add(new CaseReader.Problem(CaseReader.Problem.WHOLE_FILE, "… and " + unlisted + " more problems"));
        }
        return List.copyOf(all);
    }

    static String child(String parent, String key) {
        return parent.isEmpty() ? key : parent + "." + key;
    }

    static String element(String parent, int index) {
        return parent + "[" + index + "]";
    }
}
