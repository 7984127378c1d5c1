package org.stasissheet.intake;

import java.util.ArrayList;
import java.util.List;

/** Collects the problems of one read, in the order found. Paths are dotted; the empty path is the whole file. */
final class Problems {
    private final List<CaseReader.Problem> found = new ArrayList<>();

    void add(String path, String message) {
        found.add(new CaseReader.Problem(path.isEmpty() ? CaseReader.Problem.WHOLE_FILE : path, message));
    }

    int count() {
        return found.size();
    }

    boolean isEmpty() {
        return found.isEmpty();
    }

    List<CaseReader.Problem> list() {
        return List.copyOf(found);
    }

    static String child(String parent, String key) {
        return parent.isEmpty() ? key : parent + "." + key;
    }

    static String element(String parent, int index) {
        return parent + "[" + index + "]";
    }
}
