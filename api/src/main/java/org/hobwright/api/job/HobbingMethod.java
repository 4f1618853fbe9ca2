package org.hobwright.api.job;

import org.hobwright.api.ApiStatus;

/**
 * Direction of axial feed relative to the hob's cutting motion at the point of contact
 * (definitions as in R. P. Phillips, "Design and Selection of Hobs", Gear Technology).
 */
@ApiStatus(since = "1.0")
public enum HobbingMethod {
    /** Hob teeth move against the feed at contact; chip starts thick. The usual production choice. */
    CLIMB,
    /** Hob teeth move with the feed at contact; chip starts thin. */
    CONVENTIONAL
}
