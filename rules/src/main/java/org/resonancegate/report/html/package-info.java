/**
 * The HTML report: {@link org.resonancegate.report.html.HtmlReport} turns
 * {@link org.resonancegate.report.Results} into one self-contained page. {@code Pages} and
 * {@code SpecViews} word the results into a {@link org.resonancegate.report.html.Page};
 * {@code InterferencePlot} and {@code ResponsePlot} lay the plots out as plain
 * {@link org.resonancegate.report.html.Svg} shapes; the jte templates under {@code src/main/jte}
 * place and escape both. Nothing here computes physics: every number comes from the results.
 */
package org.resonancegate.report.html;
