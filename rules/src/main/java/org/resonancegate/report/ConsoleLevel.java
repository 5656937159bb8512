package org.resonancegate.report;

/** How loudly a front end should print a console line; maps onto any logger's levels. */
public enum ConsoleLevel {
    INFO, WARNING, ERROR
}
