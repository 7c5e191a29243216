package barwright.ui.dynamics;

import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JSlider;
import java.awt.BorderLayout;
import java.awt.FlowLayout;
import java.util.Locale;

/**
 * The playback's controls: play and pause, the speed (real time or slow motion) and the time cursor as a
 * slider, which takes the arrow keys and the mouse wheel. Event thread.
 */
final class PlaybackBar extends JPanel {
    /** The time slider's steps over a run. */
    static final int STEPS = 1000;
    private static final String[] SPEEDS = {"1\u00D7 (real time)", "0.25\u00D7", "0.1\u00D7"};
    private static final double[] FACTORS = {1, 0.25, 0.1};
    private final Playback playback;
    private final JButton play = new JButton("Play");
    private final JComboBox<String> speed = new JComboBox<>(SPEEDS);
    private final JSlider cursor = new JSlider(0, STEPS, 0);
    private final JLabel clock = new JLabel();
    private boolean following;

    PlaybackBar(Playback playback) {
        super(new BorderLayout(6, 2));
        this.playback = playback;
        play.setName("turnIn.play");
        play.setToolTipText("Play the response (Space); press again to pause");
        play.addActionListener(event -> {
            if (playback.isPlaying()) {
                playback.pause();
            } else {
                playback.play();
            }
        });
        speed.setName("turnIn.speed");
        speed.setSelectedIndex(1);
        playback.speed(FACTORS[1]);
        speed.setToolTipText("Slow motion shows the overshoot: a quarter or a tenth of real time");
        speed.addActionListener(event -> playback.speed(FACTORS[speed.getSelectedIndex()]));
        cursor.setName("turnIn.cursor");
        cursor.setToolTipText("The instant shown in the picture (arrow keys and the mouse wheel move it)");
        cursor.addChangeListener(event -> {
            if (!following) {
                playback.pause();
                playback.set(cursor.getValue() * playback.end() / STEPS);
            }
        });
        cursor.addMouseWheelListener(event -> cursor.setValue(cursor.getValue() - event.getWheelRotation() * 10));
        playback.addListener(this::follow);
        playback.addStateListener(() -> play.setText(playback.isPlaying() ? "Pause" : "Play"));
        JPanel buttons = new JPanel(new FlowLayout(FlowLayout.LEADING, 4, 0));
        buttons.add(play);
        buttons.add(speed);
        add(buttons, BorderLayout.WEST);
        add(cursor, BorderLayout.CENTER);
        clock.setName("turnIn.clock");
        add(clock, BorderLayout.EAST);
        follow(0);
    }

    /** Moves the slider with the clock without feeding the move back. */
    private void follow(double time) {
        following = true;
        try {
            cursor.setValue((int) Math.round(time / playback.end() * STEPS));
        } finally {
            following = false;
        }
        clock.setText(String.format(Locale.ROOT, "%.3f s", time));
    }

    /** @return the play/pause button (for the window tests and the Space key) */
    JButton playButton() {
        return play;
    }

    /** Chooses a speed by its place: 0 real time, 1 a quarter, 2 a tenth. */
    void chooseSpeed(int index) {
        speed.setSelectedIndex(index);
    }
}
