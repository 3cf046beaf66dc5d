/**
 * Writing a review: the results tree (the JSON contract), the console summary, Java2D
 * drawings, the PDF report and PNG figures. The only package that imports OpenPDF. Uses
 * {@code units}, {@code model}, {@code statics}, {@code solve} and {@code review}; nothing of
 * {@code cli}.
 */
package plumbline.report;
