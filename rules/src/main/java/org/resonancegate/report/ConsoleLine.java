package org.resonancegate.report;

import java.util.Objects;

/** One line for a console, without a level prefix: the front end adds its own ({@code [ERROR]}). */
public record ConsoleLine(ConsoleLevel level, String text) {

    public ConsoleLine {
        Objects.requireNonNull(level, "level");
        Objects.requireNonNull(text, "text");
    }
}
