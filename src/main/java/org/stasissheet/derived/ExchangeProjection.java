package org.stasissheet.derived;

/**
 * One quantity projected after a plasma exchange, at two moments, in the unit of the starting value.
 *
 * @param immediate           right after the procedure: only the plasma was exchanged (one-compartment, e^−V)
 * @param afterRedistribution after the paraprotein outside the vessels has flowed back (1 − f(1 − e^−V)); never
 *                            below {@code immediate}
 */
public record ExchangeProjection(double immediate, double afterRedistribution) {
    /** The plain words for each moment, one place for every renderer. */
    public static final String IMMEDIATE_LABEL = "right after the procedure";
    public static final String AFTER_REDISTRIBUTION_MEANING = "once the paraprotein outside the vessels has flowed "
            + "back";
    public static final String AFTER_REDISTRIBUTION_LABEL = "after redistribution (" + AFTER_REDISTRIBUTION_MEANING
            + ")";
    /** Short forms for narrow table headings. */
    public static final String IMMEDIATE_SHORT = "right after";
    public static final String AFTER_REDISTRIBUTION_SHORT = "after redistribution";

    public ExchangeProjection {
        if (!Double.isFinite(immediate) || !Double.isFinite(afterRedistribution) || immediate < 0
                || afterRedistribution < immediate) {
            throw new IllegalArgumentException("projection needs finite 0 ≤ immediate ≤ after redistribution, was "
                    + immediate + " and " + afterRedistribution);
        }
    }
}
