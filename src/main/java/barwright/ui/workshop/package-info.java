/** The window's workshop page: a bar's rate from readings typed or pasted in, and the measured factor put into the car. */
package barwright.ui.workshop;
