package org.trendwright.team;

/** What an API token allows: reading only, or reading and writing (within its member's role). */
public enum Scope {
    READ("read"),
    READ_WRITE("read-write");

    private final String jsonName;

    Scope(String jsonName) {
        this.jsonName = jsonName;
    }

    public String jsonName() {
        return jsonName;
    }

    /** The scope of a JSON name; refuses an unknown one. */
    public static Scope of(String name) {
        for (Scope scope : values()) {
            if (scope.jsonName.equals(name)) {
                return scope;
            }
        }
        throw new TeamException(400, "bad-request", "scope must be read or read-write, got '" + name + "'.");
    }
}
