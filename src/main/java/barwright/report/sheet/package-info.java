/**
 * The setup sheet as PDF (Apache PDFBox): drawings, tables and charts as vector lines in the standard fonts.
 * No AWT or Swing here.
 */
package barwright.report.sheet;
