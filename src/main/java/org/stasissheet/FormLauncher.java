package org.stasissheet;

/**
 * Reaches the JavaFX form by name, so that no JavaFX class is loaded unless the form is really opened
 * (a plain reference could be resolved early by the verifier).
 */
final class FormLauncher {
    static final String FORM_CLASS = "org.stasissheet.ui.FormApp";

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
}
