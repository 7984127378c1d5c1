package org.stasissheet.ui.register;

import java.util.Optional;
import java.util.function.Consumer;
import javafx.stage.Stage;
import org.stasissheet.register.store.Register;
import org.stasissheet.ui.app.Background;
import org.stasissheet.ui.app.FormSettings;

/**
 * Opens the register window from the form: the SQLite register in the data folder, or the database named by the
 * start-up option {@code -Dstasis.registerDb=URL} (the same URL as {@code --db}; a password comes from
 * {@code STASIS_DB_PASSWORD} or a .pgpass file). Opening (and a first-use schema update) runs in the background.
 */
public final class RegisterLauncher {
    public static final String PROPERTY = "stasis.registerDb";

    private RegisterLauncher() {
    }

    public static void open(FormSettings settings, Background background, Consumer<String> onProblem) {
        Optional<String> db = Optional.ofNullable(System.getProperty(PROPERTY)).filter(s -> !s.isBlank());
        background.run(() -> Register.open(db, settings.dataFolder(), System.getenv()),
                register -> RegisterWindow.open(new Stage(), register, settings, RegisterWindow.DEFAULT_POLL),
                e -> onProblem.accept("The referral register could not be opened: " + e.getMessage()));
    }
}
