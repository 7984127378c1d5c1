package org.stasissheet.files;

import java.io.IOException;

/** A file could not be written. The message is one line for people, e.g. "cannot write /x/y.pdf: folder does not exist". */
public final class FileWriteException extends IOException {
    private static final long serialVersionUID = 1L;

    public FileWriteException(String message, Throwable cause) {
        super(message, cause);
    }
}
