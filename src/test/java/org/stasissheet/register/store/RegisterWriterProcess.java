package org.stasissheet.register.store;

import java.nio.file.Path;
import java.time.Instant;
import java.util.Optional;

/**
 * Run in its own JVM by {@link RegisterContract}: adds referrals to the register named by its argument as fast as it
 * can, printing each new id, until it is killed. The password, if any, comes from the environment as for users.
 */
public final class RegisterWriterProcess {
    private RegisterWriterProcess() {
    }

    public static void main(String[] args) {
        Register r = Register.open(Optional.of(args[0]), Path.of(args[1]), System.getenv());
        Instant t = RegisterContract.T0;
        for (int i = 0; ; i++) {
            long id = r.add(RegisterFixtures.referral(i % 2 == 0 ? RegisterFixtures.ACT_NOW_CASE
                    : RegisterFixtures.REVIEW_CASE, t.plusSeconds(i)));
            System.out.println(id);
            System.out.flush();
        }
    }
}
