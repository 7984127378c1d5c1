package org.stasissheet;

/**
 * Reaches the JavaFX form by name, so that no JavaFX class is loaded unless the form is really opened
 * (a plain reference could be resolved early by the verifier).
 */
final class FormLauncher {
    static final String FORM_CLASS = "org.stasissheet.ui.FormApp";
    static final String TRAINING_CLASS = "org.stasissheet.ui.FormTraining";
    /** How the form's training answers when the toolkit could not open a window ({@code FormTraining.NO_WINDOW}). */
    static final String NO_WINDOW = "no window: ";

    private FormLauncher() {
    }

    static boolean available() {
        return FormLauncher.class.getClassLoader().getResource(FORM_CLASS.replace('.', '/') + ".class") != null;
    }

    static void launch(String[] args) {
        try {
            Class.forName(FORM_CLASS).getMethod("open", String[].class).invoke(null, (Object) args);
        } catch (ReflectiveOperationException e) {
            throw new IllegalStateException("the form could not be started", e);
        }
    }

    /**
     * The form's part of {@link ArchiveTraining}: starts the form, waits for its first worksheet, closes it.
     * Returns an empty string when it did, else why not ({@link #NO_WINDOW} first when no window could open).
     */
    static String train(long timeoutSeconds) {
        try {
            return (String) Class.forName(TRAINING_CLASS).getMethod("run", long.class).invoke(null, timeoutSeconds);
        } catch (ReflectiveOperationException e) {
            return "the form could not be started: " + e;
        }
    }
}
