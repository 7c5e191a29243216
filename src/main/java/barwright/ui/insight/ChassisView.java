package barwright.ui.insight;

import barwright.insight.ChassisStudyResult;
import barwright.report.insight.ChassisText;
import barwright.ui.chart.ChassisChart;
import barwright.ui.field.ViewSettings;
import barwright.ui.panel.ScrollingPage;

import javax.swing.JComponent;
import javax.swing.JPanel;
import javax.swing.JTextArea;
import java.awt.BorderLayout;
import java.util.Locale;

/**
 * What a flexible chassis costs: front share, the share of a bar change that reaches the tyres (left scale,
 * percent) and roll gradient (right scale) against chassis torsional stiffness on a log scale, with the rigid
 * and no-stiffness limits, this car, and the stiffness at which a bar change keeps 80 % of its effect.
 */
public final class ChassisView extends JPanel {
    /**
     * The chart's least height in lines of text: a title line, a legend of three, the stiffness axis's two, and a
     * plot of some nine lines for the markers' labels.
     */
    static final int LEAST_LINES = 15;
    private final ViewSettings view;
    private final ChassisChart chart;
    private final JTextArea statement = InsightCharts.sentences("insight.chassis.statement");

    ChassisView(ViewSettings view) {
        super(new BorderLayout());
        this.view = view;
        setName("insight.chassis");
        chart = new ChassisChart(view);
        JComponent panel = chart.panel("insight.chassis.chart");
        add(ScrollingPage.chartOverWords(panel, statement, LEAST_LINES, InsightPanel.CHART_SHARE), BorderLayout.CENTER);
    }

    void show(ChassisStudyResult study) {
        chart.show(study);
        statement.setText(text(study));
        statement.setCaretPosition(0);
    }

    private String text(ChassisStudyResult study) {
        ChassisText words = new ChassisText(view.units());
        String current = study.current() == null
                ? "This car's file gives no chassis stiffness, so it is analysed as rigid."
                : String.format(Locale.ROOT, "This car's chassis lets %.0f %% of the bar change through; "
                + "its front share is %.1f %% against %.1f %% with a rigid chassis.",
                study.current().deliveredShare() * 100, study.current().frontShare() * 100,
                study.rigid().frontShare() * 100);
        StringBuilder out = new StringBuilder(words.statement(study)).append("\n").append(current);
        study.notes().forEach(note -> out.append("\nNote: ").append(note));
        return out.toString();
    }

    ChassisChart chart() {
        return chart;
    }

    public String statementText() {
        return statement.getText();
    }

    @Override
    public void updateUI() {
        super.updateUI();
        if (chart != null) {
            chart.style();
        }
    }
}
