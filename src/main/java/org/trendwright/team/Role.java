package org.trendwright.team;

import java.util.Locale;

/**
 * What a member may do. Each role includes the ones below it: an admin can do everything an editor
 * can, an editor everything a viewer can.
 */
public enum Role {
    /** Reads series, fits and briefs. */
    VIEWER,
    /** Also uploads series, fits them and publishes briefs. */
    EDITOR,
    /** Also manages members and reads the audit log. */
    ADMIN;

    /** The name used in JSON and in the store ("admin", "editor", "viewer"). */
    public String jsonName() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** True when this role includes {@code other}. */
    public boolean includes(Role other) {
        return compareTo(other) >= 0;
    }

    /** The role of a JSON name; refuses an unknown one. */
    public static Role of(String name) {
        for (Role role : values()) {
            if (role.jsonName().equals(name)) {
                return role;
            }
        }
        throw new TeamException(400, "bad-request", "role must be admin, editor or viewer, got '" + name + "'.");
    }
}
