package org.hobwright.api;

import java.lang.annotation.Documented;
import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;

/**
 * Stability marker of a public api type: the api version it appeared in and how far a host may
 * rely on it. Every public type of {@code hobwright-api} carries one (a test checks it); a method,
 * constructor or constant added to a type after the type appeared carries one too.
 *
 * <p>Stable types change only as the api's version rule allows ({@link org.hobwright.api.spi.ApiVersion}):
 * within one major version only additions, and each addition raises the minor version.
 */
@Documented
@Retention(RetentionPolicy.RUNTIME)
@Target({ElementType.TYPE, ElementType.ANNOTATION_TYPE, ElementType.METHOD, ElementType.CONSTRUCTOR,
        ElementType.FIELD, ElementType.RECORD_COMPONENT})
@ApiStatus(since = "1.1")
public @interface ApiStatus {

    /** {@return the api version ({@code major.minor}) this type appeared in} */
    String since();

    /** {@return how far a host may rely on the type} */
    Stability stability() default Stability.STABLE;

    /** How far a host may rely on a type. */
    @ApiStatus(since = "1.1")
    enum Stability {
        /** Changes only as the version rule allows: additions within a major version. */
        STABLE,
        /** New and still open to change in a minor version; the javadoc says what may change. */
        EXPERIMENTAL
    }
}
