package org.headway.report;

/**
 * A method written out on the sheet.
 *
 * @param name name of the method
 * @param equation the equation in plain Unicode
 * @param citation full citation
 */
public record Method(String name, String equation, String citation) {}
