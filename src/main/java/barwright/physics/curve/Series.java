package barwright.physics.curve;

/**
 * One line of a chart, in SI.
 *
 * @param name what the legend says
 * @param x    abscissae, rising
 * @param y    ordinates, one per abscissa
 */
public record Series(String name, double[] x, double[] y) {
    public Series {
        if (x.length != y.length) {
            throw new IllegalArgumentException("a series needs as many x as y values");
        }
        x = x.clone();
        y = y.clone();
    }

    @Override
    public double[] x() {
        return x.clone();
    }

    @Override
    public double[] y() {
        return y.clone();
    }

    public int size() {
        return x.length;
    }
}
