package org.stasissheet.ui;

import java.util.concurrent.TimeUnit;
import javafx.application.Platform;

/**
 * Benchmark, not a test: one cold start of the form, from the moment the script started the process
 * ({@code -Dstasis.bench.t0}, epoch milliseconds) to the first pulse in which the demo case's worksheet (its
 * verdict cards) is laid out in a showing window; that pulse hands the scene to the renderer. It starts the form
 * exactly as {@code stasis-sheet} without arguments does ({@link org.stasissheet.Main}), and only watches it from
 * a daemon thread. Prints one line: the milliseconds. Run by {@code src/bench/first-worksheet.sh}.
 */
public final class FirstWorksheetBench {
    private FirstWorksheetBench() {
    }

    public static void main(String[] args) {
        long t0 = Long.parseLong(System.getProperty("stasis.bench.t0",
                String.valueOf(java.lang.management.ManagementFactory.getRuntimeMXBean().getStartTime())));
        Thread watcher = new Thread(() -> watch(t0), "first-worksheet-watcher");
        watcher.setDaemon(true);
        watcher.start();
        org.stasissheet.Main.main(new String[0]);
    }

    private static void watch(long t0) {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
        while (System.nanoTime() < deadline) {
            try {
                Platform.runLater(() -> check(t0));
            } catch (IllegalStateException notStartedYet) {
                // the toolkit is not up yet: look again shortly
            }
            sleep(5);
        }
        System.out.println("no worksheet on screen within 60 s");
        System.exit(1);
    }

    private static boolean armed;

    /** On the FX thread: once the verdicts are in a showing window, the next layout pulse is the one drawn. */
    private static void check(long t0) {
        if (!armed && FirstWorksheetWatch.arm(w -> {
            System.out.println(System.currentTimeMillis() - t0);
            System.out.flush();
            // exit from a thread of its own: shutdown hooks may need this (the FX) thread
            new Thread(() -> System.exit(0), "first-worksheet-exit").start();
        })) {
            armed = true;
        }
    }

    private static void sleep(long millis) {
        try {
            Thread.sleep(millis);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
