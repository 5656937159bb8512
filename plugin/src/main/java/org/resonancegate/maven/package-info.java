/**
 * The Maven front end: goals only. {@link org.resonancegate.maven.AbstractGateMojo} maps the
 * shared parameters to a {@link org.resonancegate.check.CheckRequest}, hands it to the engine,
 * writes the chosen report files, and prints the console report through Maven's log;
 * {@link org.resonancegate.maven.Verdict} says what the results mean for the build. The
 * {@code check} goal ({@link org.resonancegate.maven.CheckMojo}) turns that into a build outcome
 * (a failing or unreadable spec is a build failure; broken configuration or I/O an execution
 * error); the {@code report} goal ({@link org.resonancegate.maven.ReportMojo}) only warns. Which
 * files to check is decided here, by Maven-style include and exclude patterns; what they mean is
 * decided in {@code rules}.
 */
package org.resonancegate.maven;
