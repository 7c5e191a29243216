/**
 * Catalogues of stock bar and tube sizes: the built-in ones (each with its basis, common practice or the
 * standard it follows) and users' own files, validated with key paths like the vehicle file.
 */
package barwright.sizing.catalogue;
