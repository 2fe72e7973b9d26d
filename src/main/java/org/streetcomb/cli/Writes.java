package org.streetcomb.cli;

import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;

/**
 * Marks an option whose value is a file (or, with {@link #folder}, a folder) the command writes, so that
 * {@link OutputGuard} can tell outputs from inputs without a list of option names to keep in step.
 */
@Retention(RetentionPolicy.RUNTIME)
@Target(ElementType.FIELD)
@interface Writes {

    /** The option names a folder the command writes files into, not a file. */
    boolean folder() default false;

    /** The option writes one text file, which {@code -} sends to standard output ({@link StandardStreams}). */
    boolean standardOutput() default false;
}
