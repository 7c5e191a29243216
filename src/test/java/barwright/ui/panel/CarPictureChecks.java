package barwright.ui.panel;

import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;

/** Checks on where the car picture put its words, shared by its own test and presentation mode's window test. */
public final class CarPictureChecks {
    private CarPictureChecks() {
    }

    /**
     * @return a line for each pair of the picture's words (the names beside the car, the wheel loads' figures)
     * that overlap, for a word over the car or off the picture, and for the words above the drawing reaching
     * down to the car
     */
    public static List<String> overlaps(CarBehindView.Placement placed, int width, int height) {
        List<String> faults = new ArrayList<>();
        List<Rectangle2D> words = new ArrayList<>(placed.labels());
        words.addAll(placed.loadFigures());
        for (int i = 0; i < words.size(); i++) {
            Rectangle2D word = words.get(i);
            for (int j = i + 1; j < words.size(); j++) {
                if (word.intersects(words.get(j))) {
                    faults.add("words " + word + " and " + words.get(j) + " overlap");
                }
            }
            List<Rectangle2D> car = new ArrayList<>(placed.tyres());
            car.add(placed.body());
            for (Rectangle2D part : car) {
                if (part.intersects(word)) {
                    faults.add("words " + word + " over the car " + part);
                }
            }
            if (word.getX() < 0 || word.getMaxX() > width || word.getY() < 0 || word.getMaxY() > height) {
                faults.add("words " + word + " off the picture " + width + "x" + height);
            }
        }
        double carTop = Math.min(placed.body().getY(), Math.min(placed.tyres().get(0).getY(),
                placed.tyres().get(1).getY()));
        if (placed.wordsBottom() > carTop) {
            faults.add("the words above the drawing reach " + placed.wordsBottom() + ", the car's top is " + carTop);
        }
        return faults;
    }
}
