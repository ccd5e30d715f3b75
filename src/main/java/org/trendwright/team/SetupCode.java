package org.trendwright.team;

import java.util.concurrent.atomic.AtomicReference;

/**
 * The one-time code that creates the first admin: the operator's own (TRENDWRIGHT_SETUP_CODE) or
 * a random one the server prints once on its console. It is used up by the first successful
 * setup. Thread-safe.
 */
public final class SetupCode {

    private final AtomicReference<String> code;
    private final boolean generated;

    private SetupCode(String code, boolean generated) {
        this.code = new AtomicReference<>(code);
        this.generated = generated;
    }

    /**
     * The given code, or a random one when none is given. It is only ever accepted while no member
     * exists (the setup route checks that first).
     */
    public static SetupCode of(String given) {
        return given != null ? new SetupCode(given, false) : new SetupCode(Secrets.random("").substring(0, 20), true);
    }

    /** True when {@code attempt} is the code and it has not been used. */
    public boolean matches(String attempt) {
        return Secrets.same(code.get(), attempt);
    }

    /** Uses the code up. */
    public void used() {
        code.set(null);
    }

    /**
     * The console lines that tell a new operator how to begin, or null when setup is done. The
     * generated code appears here and nowhere else (never in the log).
     */
    public String announcement(String address) {
        String current = code.get();
        if (current == null) {
            return null;
        }
        String which = generated ? "the setup code " + current : "the setup code from TRENDWRIGHT_SETUP_CODE";
        return "Trendwright has no members yet. Open " + address + "/setup and enter " + which
                + " to create the first admin.";
    }
}
