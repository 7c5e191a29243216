/**
 * A general linear 3-D frame solver (the direct stiffness method with two-node Euler-Bernoulli beam
 * elements), knowing nothing of cars or bars.
 *
 * <p><b>Units.</b> SI throughout: m, N, N m, rad, Pa, m^2, m^4; spring rates in N/m or N m/rad.
 *
 * <p><b>Axes and freedoms.</b> Nodes, loads, displacements and reactions are in one right-handed global
 * frame X, Y, Z chosen by the caller. Every node has six freedoms, in this order: translations u_X, u_Y,
 * u_Z, then small rotations theta_X, theta_Y, theta_Z (right-hand rule about the global axes). Equation
 * 6 n + c of {@link barwright.solver.frame.FrameSystem#unsupportedStiffness} is freedom c of node n.
 *
 * <p><b>Element axes.</b> Local x' runs from an element's start node to its end node; z' is the part of the
 * element's orientation vector perpendicular to x'; y' = z' x x' completes a right-handed set. Without an
 * orientation, global Z is used, or global X for an element within about 26 degrees of Z. Section
 * properties I_y and I_z are about y' and z'.
 *
 * <p><b>Signs of the stress resultants.</b> At a cut through an element, the resultants are what the part on
 * the +x' side exerts on the part on the -x' side, in local axes: axial force positive in tension; shears
 * V_y, V_z along +y', +z'; torque and bending moments right-handed about x', y', z'.
 *
 * <p><b>Supports.</b> A {@link barwright.solver.frame.Support} holds one node along one direction: a
 * linear spring to ground, or (rate infinite) a rigid constraint, removed from the equations by writing the
 * node's freedoms in axes that contain the held directions (a skewed support). A reaction is the force and
 * moment the supports exert on a node, so applied loads plus reactions are in equilibrium.
 *
 * <p><b>Not modelled.</b> Shear deformation (Timoshenko), loads between nodes, geometric nonlinearity and
 * buckling, warping of open sections.
 */
package barwright.solver.frame;
