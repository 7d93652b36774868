package org.feedernote.calc;

import org.feedernote.trace.Q;

/**
 * The fault path from the source to a board, as series resistance and reactance: the phase path
 * at 20 °C (maximum three-phase fault), the line-neutral loop at 20 °C (maximum single-phase
 * fault), the line-protective-conductor loop at the maximum operating temperature (Ze) and at the
 * end-of-fault temperature (minimum earth fault); and the results at the board.
 */
public record BoardFault(Q r3, Q x3, Q rN, Q xN, Q rE, Q xE, Q rF, Q xF, Q ik3, Q ik1, Q ze) {}
