package org.feedernote.calc;

import org.feedernote.trace.Q;

/**
 * The fault path from the source to a board. The phase path at 20 °C and the line-neutral loop at
 * 20 °C are kept as resistance and reactance and added as complex quantities (maximum fault
 * currents). The earth-fault loop impedance Ze is kept as a magnitude and cable loops are added to
 * it arithmetically, Zs = Ze + Z_loop, as the hand method does and on the safe side; zeF is the
 * same at the end-of-fault temperature (minimum earth fault).
 */
public record BoardFault(Q r3, Q x3, Q rN, Q xN, Q ze, Q zeF, Q ik3, Q ik1) {}
