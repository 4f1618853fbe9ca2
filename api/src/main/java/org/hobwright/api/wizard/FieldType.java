package org.hobwright.api.wizard;

import org.hobwright.api.ApiStatus;

/** How a host should let the user enter a field. */
@ApiStatus(since = "1.0")
public enum FieldType {
    /** A decimal number in the field's unit. */
    NUMBER,
    /** A whole number. */
    INTEGER,
    /** An angle: decimal degrees or degrees-minutes-seconds ({@code 1.5}, {@code 1°30'}, {@code 1 30 0}). */
    ANGLE,
    /** One of {@link FieldSpec#choices()}. */
    CHOICE,
    /** Yes or no. */
    BOOLEAN,
    /** Free text. */
    TEXT
}
