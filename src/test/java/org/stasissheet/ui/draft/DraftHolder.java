package org.stasissheet.ui.draft;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Optional;

/**
 * A stand-in for a form running in another process (started by {@link DraftStoreTest}): it marks a session
 * running in the folder given, saves a draft, says "ready" and then waits on standard input until the test kills
 * it, which is a crash: no clean end.
 */
public final class DraftHolder {
    private DraftHolder() {
    }

    public static void main(String[] args) throws Exception {
        DraftStore store = new DraftStore(Path.of(args[0]));
        store.markRunning(Optional.empty());
        store.saveDraft(args[1].getBytes(StandardCharsets.UTF_8));
        System.out.println("ready");
        System.out.flush();
        System.in.read();
    }
}
