/**
 * Numerics without car knowledge: root finding wrappers, sweeps, and the progress and cancel interface that
 * long work reports through. No Swing here.
 */
package barwright.solver;
