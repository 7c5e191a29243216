/** Link preload and cross weight at rest (model.md 9). */
package barwright.sizing.preload;
