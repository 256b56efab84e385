package org.headway.dimensional;

/** The SI base dimensions, with the symbols of the SI Brochure (9th ed., 2019, table 3). */
public enum Dimension {
    MASS("M"),
    LENGTH("L"),
    TIME("T"),
    TEMPERATURE("Θ"),
    CURRENT("I"),
    AMOUNT("N"),
    LUMINOUS_INTENSITY("J");

    private final String symbol;

    Dimension(String symbol) {
        this.symbol = symbol;
    }

    /** The dimension symbol, e.g. "M". */
    public String symbol() {
        return symbol;
    }
}
