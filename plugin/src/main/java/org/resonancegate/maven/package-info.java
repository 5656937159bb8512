/**
 * The Maven front end: goals only. {@link org.resonancegate.maven.CheckMojo} maps its parameters
 * to a {@link org.resonancegate.check.CheckRequest}, hands it to the engine, writes
 * {@code results.json}, prints the console report through Maven's log and turns the statuses
 * into a build outcome (a failing or unreadable spec is a build failure; broken configuration or
 * I/O an execution error). Which files to check is decided here, by Maven-style include and
 * exclude patterns; what they mean is decided in {@code rules}.
 */
package org.resonancegate.maven;
