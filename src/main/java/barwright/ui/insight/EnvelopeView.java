package barwright.ui.insight;

import barwright.insight.LiftEnvelope;
import barwright.insight.LiftEnvelopeResult;
import barwright.io.VehicleFileException;
import barwright.loading.VehicleLoader;
import barwright.physics.VehicleAnalysis;
import barwright.report.insight.EnvelopeText;
import barwright.ui.chart.EnvelopeChart;
import barwright.ui.field.ViewSettings;
import barwright.ui.panel.ScrollingPage;
import barwright.ui.task.BackgroundWork;

import javax.swing.JComponent;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JFileChooser;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JTextArea;
import javax.swing.UIManager;
import javax.swing.filechooser.FileNameExtensionFilter;
import java.awt.BorderLayout;
import java.awt.FlowLayout;
import java.nio.file.Path;

/**
 * Where each inside wheel lifts, against braking and power: the chart, the figures in sentences, and what it
 * is compared with (the previous setting, or a vehicle file chosen by the person). Event thread.
 */
public final class EnvelopeView extends JPanel {
    static final String PREVIOUS = "the previous setting";
    /**
     * The chart's least height in lines of text: a title of two lines, a legend of three or four, the axes' two
     * and a plot of some eight lines (at 28 points some 260 px of plot).
     */
    static final int LEAST_LINES = 16;
    private final ViewSettings view;
    private final EnvelopeChart chart = new EnvelopeChart();
    private final JTextArea sentences = InsightCharts.sentences("insight.envelope.sentences");
    private final JComboBox<String> compareWith = new JComboBox<>(new String[]{PREVIOUS, "a vehicle file"});
    private final JButton chooseFile = new JButton("Choose file…");
    private final JLabel compareNote = new JLabel(" ");
    private final BackgroundWork<Path, LiftEnvelopeResult> fileWorker;
    private LiftEnvelopeResult current;
    private LiftEnvelopeResult previous;
    private LiftEnvelopeResult fromFile;

    EnvelopeView(ViewSettings view) {
        super(new BorderLayout());
        this.view = view;
        setName("insight.envelope");
        JComponent panel = chart.panel("insight.envelope.chart");
        JPanel words = new JPanel(new BorderLayout());
        words.add(controls(), BorderLayout.NORTH);
        words.add(sentences, BorderLayout.CENTER);
        add(ScrollingPage.chartOverWords(panel, words, LEAST_LINES, InsightPanel.CHART_SHARE), BorderLayout.CENTER);
        fileWorker = BackgroundWork.newestOnly(EnvelopeView::envelopeOf, this::fileArrived, this::fileFailed);
    }

    /** The choice of what is drawn dashed, then the file button and what became of the file, on a row below. */
    private JPanel controls() {
        JPanel bar = new JPanel(new FlowLayout(FlowLayout.LEFT, 6, 2));
        JPanel file = new JPanel(new FlowLayout(FlowLayout.LEFT, 6, 2));
        JLabel label = new JLabel("Dashed lines:");
        label.setLabelFor(compareWith);
        compareWith.setName("insight.envelope.compareWith");
        compareWith.setToolTipText("Draw the previous setting of this car beside it, or another vehicle file");
        compareWith.addActionListener(event -> {
            chooseFile.setEnabled(compareWith.getSelectedIndex() == 1);
            redraw();
        });
        chooseFile.setName("insight.envelope.chooseFile");
        chooseFile.setEnabled(false);
        chooseFile.addActionListener(event -> choose());
        compareNote.setName("insight.envelope.compareNote");
        bar.add(label);
        bar.add(compareWith);
        file.add(chooseFile);
        file.add(compareNote);
        JPanel rows = new JPanel(new BorderLayout());
        rows.add(bar, BorderLayout.NORTH);
        rows.add(file, BorderLayout.SOUTH);
        return rows;
    }

    private void choose() {
        JFileChooser chooser = new JFileChooser();
        chooser.setFileFilter(new FileNameExtensionFilter("Vehicle files (*.json)", "json"));
        if (chooser.showOpenDialog(this) == JFileChooser.APPROVE_OPTION) {
            compareWith(chooser.getSelectedFile().toPath());
        }
    }

    /** Reads and analyses a vehicle file in the background and draws its envelope dashed. */
    public void compareWith(Path file) {
        compareWith.setSelectedIndex(1);
        compareNote.setText("Reading " + file.getFileName() + "…");
        fileWorker.submit(file);
    }

    private static LiftEnvelopeResult envelopeOf(Path file) {
        try {
            return LiftEnvelope.of(VehicleAnalysis.analyse(VehicleLoader.read(file).vehicle()));
        } catch (VehicleFileException refused) {
            throw new IllegalArgumentException("the file was refused: " + refused.problems().get(0), refused);
        }
    }

    private void fileArrived(LiftEnvelopeResult envelope) {
        fromFile = envelope;
        compareNote.setText("dashed: " + envelope.vehicleName());
        redraw();
    }

    private void fileFailed(String message) {
        compareNote.setText("Not compared: " + message);
    }

    /** @return true when no compared file is being read */
    public boolean isIdle() {
        return fileWorker.isIdle();
    }

    void show(LiftEnvelopeResult newCurrent, LiftEnvelopeResult newPrevious) {
        current = newCurrent;
        previous = newPrevious;
        redraw();
    }

    void redraw() {
        if (current == null) {
            return;
        }
        boolean file = compareWith.getSelectedIndex() == 1;
        LiftEnvelopeResult compared = file ? fromFile : previous;
        String label = file ? (fromFile == null ? "a vehicle file" : fromFile.vehicleName()) : PREVIOUS;
        chart.show(current, compared, label);
        EnvelopeText text = new EnvelopeText(view.units());
        StringBuilder words = new StringBuilder();
        text.sentences(current).forEach(line -> words.append(line.strip()).append('\n'));
        if (compared != null) {
            words.append("\nDashed, ").append(label).append(":\n");
            text.sentences(compared).forEach(line -> words.append(line.strip()).append('\n'));
        }
        current.notes().forEach(note -> words.append("\nNote: ").append(note));
        sentences.setText(words.toString());
        sentences.setCaretPosition(0);
    }

    /** @return the envelope drawn as the previous setting, or null */
    LiftEnvelopeResult previous() {
        return previous;
    }

    /** @return the envelope of the car as it is, or null before the first */
    public LiftEnvelopeResult current() {
        return current;
    }

    EnvelopeChart chart() {
        return chart;
    }

    public String sentencesText() {
        return sentences.getText();
    }

    @Override
    public void updateUI() {
        super.updateUI();
        if (chart != null) {
            chart.style();
            sentences.setFont(UIManager.getFont("Label.font"));
        }
    }
}
