package org.hobwright.wizard.store;

import java.util.Objects;
import org.hobwright.api.job.MachineProfile;
import org.hobwright.api.job.Units;

/**
 * A machine profile as a file holds it: the profile (canonical units), the unit the file is
 * written in, and the description shown in listings.
 *
 * @param profile     the machine profile
 * @param units       the file's length unit
 * @param description one line saying what the machine is (may be empty)
 */
public record MachineFile(MachineProfile profile, Units units, String description) {
    public MachineFile {
        Objects.requireNonNull(profile, "profile");
        Objects.requireNonNull(units, "units");
        Objects.requireNonNull(description, "description");
    }

    /** The profile's name. */
    public String name() {
        return profile.name();
    }
}
