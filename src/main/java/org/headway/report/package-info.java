/**
 * The head-loss sheet for review: PDF (PDFBox, charts as vectors), workbook with live formulas a
 * checker can audit, and CSV. Every sheet carries the inputs, methods with citations, results,
 * cautions, the standing review caution, the input hash and the Headway version.
 */
package org.headway.report;
