/**
 * Dimensions, the table of accepted units and the reader of {@code "<number> <unit>"} texts.
 * Units exist only at the edges: values leave this package in SI.
 */
package org.resonancegate.units;
