package org.feedernote.calc;

import org.feedernote.trace.Q;

/**
 * A cable's impedance per phase (R, X in Ω/km at the temperature used) and its voltage-drop
 * figures in mV/A/m for the circuit's number of phases; r20 and alpha are kept for the fault path.
 */
public record ImpedanceResult(Q theta, Q resistance, Q reactance, Q r, Q x, Q z, int phases, Q r20, Q alpha) {}
