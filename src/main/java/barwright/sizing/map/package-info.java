/** The adjustment map: every front arm hole against every rear one, for the car's bars or candidate bars. */
package barwright.sizing.map;
