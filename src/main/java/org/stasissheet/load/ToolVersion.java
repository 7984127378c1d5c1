package org.stasissheet.load;

/** The tool's version as stamped in the jar manifest at build time. */
public final class ToolVersion {
    private ToolVersion() {
    }

    public static String get() {
        String v = ToolVersion.class.getPackage().getImplementationVersion();
        return v == null ? "development" : v;
    }
}
