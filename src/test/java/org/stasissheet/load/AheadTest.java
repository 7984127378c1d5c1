package org.stasissheet.load;

import static org.junit.jupiter.api.Assertions.*;

import java.io.IOException;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.atomic.AtomicReference;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** Work run ahead on a thread of its own must look to the caller exactly as if it had run in its place. */
class AheadTest {
    @Test
    @DisplayName("the result arrives, from a daemon thread named after the work")
    void resultAndThread() {
        AtomicReference<Thread> ran = new AtomicReference<>();
        Ahead<String> a = Ahead.start("probe", () -> {
            ran.set(Thread.currentThread());
            return "done";
        });
        assertEquals("done", a.get());
        assertEquals("done", a.get());
        assertTrue(ran.get().isDaemon());
        assertEquals("stasis-probe", ran.get().getName());
        assertNotSame(Thread.currentThread(), ran.get());
    }

    @Test
    @DisplayName("an unchecked exception or an error is thrown to the caller as it was, not wrapped")
    void failuresAsThemselves() {
        IllegalArgumentException boom = new IllegalArgumentException("bad rule folder");
        Ahead<Object> a = Ahead.start("fails", () -> {
            throw boom;
        });
        assertSame(boom, assertThrows(IllegalArgumentException.class, a::get));
        ExceptionInInitializerError error = new ExceptionInInitializerError("font");
        Ahead<Object> b = Ahead.start("errs", () -> {
            throw error;
        });
        assertSame(error, assertThrows(ExceptionInInitializerError.class, b::get));
        Ahead<Object> c = Ahead.start("checked", () -> {
            throw new IOException("disk");
        });
        IllegalStateException wrapped = assertThrows(IllegalStateException.class, c::get);
        assertInstanceOf(IOException.class, wrapped.getCause());
    }

    @Test
    @DisplayName("an interrupt while waiting does not lose the result, and the interrupt is kept")
    void interruptKept() throws Exception {
        CountDownLatch release = new CountDownLatch(1);
        Ahead<Integer> a = Ahead.start("slow", () -> {
            release.await();
            return 42;
        });
        AtomicReference<Object> got = new AtomicReference<>();
        AtomicReference<Boolean> flag = new AtomicReference<>();
        Thread waiter = new Thread(() -> {
            got.set(a.get());
            flag.set(Thread.currentThread().isInterrupted());
        });
        waiter.start();
        waiter.interrupt();
        Thread.sleep(50);
        release.countDown();
        waiter.join(10_000);
        assertEquals(42, got.get());
        assertTrue(flag.get());
    }
}
