package barwright.ui.app;

import barwright.report.work.KeyFigure;
import barwright.ui.action.Dialogs;
import barwright.ui.action.FileCommands;
import barwright.ui.action.RecentFiles;
import barwright.ui.action.Settings;
import barwright.ui.action.WindowContext;
import barwright.ui.action.WindowContribution;
import barwright.ui.document.OpenDocument;
import barwright.ui.field.ViewSettings;
import barwright.ui.dynamics.DynamicsViews;
import barwright.ui.insight.InsightViews;
import barwright.ui.linkage.LinkageViews;
import barwright.ui.panel.CautionNote;
import barwright.ui.panel.FigureFormat;
import barwright.ui.panel.FiguresPanel;
import barwright.ui.panel.PagePanel;
import barwright.ui.panel.ResultsTabs;
import barwright.ui.panel.StaleBanner;
import barwright.ui.panel.VehicleEditor;
import barwright.ui.panel.WarningsPanel;
import barwright.ui.panel.WorkDialog;
import barwright.ui.present.PresentationViews;
import barwright.ui.sizing.SizingViews;
import barwright.ui.tyre.TyreViews;
import barwright.ui.workshop.WorkshopViews;
import barwright.ui.task.AnalysisController;
import barwright.ui.task.CorneringProbe;
import barwright.ui.task.ResultsModel;
import barwright.units.UnitSystem;

import javax.swing.BorderFactory;
import javax.swing.JFrame;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.UIManager;
import javax.swing.WindowConstants;
import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.Graphics;
import java.awt.event.WindowAdapter;
import java.awt.event.WindowEvent;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The main window: the vehicle editor on the left, the charts and the car picture in the middle, the key
 * figures on the right, the warnings under the charts. Event thread only.
 */
public final class MainWindow extends JFrame {
    /** The key figures column's width at the system text size (pixels): room for "1417 N·m/deg" twice. */
    static final int FIGURES_WIDTH = 390;
    /**
     * The least width the results keep beside the editor (pixels): the car picture's least width, 400, with
     * the scroll bar and the borders.
     */
    static final int RESULTS_LEAST_WIDTH = 440;
    /** The most of the window's width the editor takes when it is laid out to fit (the rest is the results'). */
    static final double EDITOR_MOST_SHARE = 0.4;
    private final OpenDocument document;
    private final Settings settings;
    private final ViewSettings view;
    private final ResultsModel results = new ResultsModel();
    private final AnalysisController analysis;
    private final CorneringProbe probe = new CorneringProbe();
    private final FileCommands files;
    private final FiguresPanel figures;
    private final ResultsTabs tabs;
    private final VehicleEditor editor;
    private final List<WindowContribution> contributions;
    private final List<Runnable> firstPaint = new ArrayList<>();
    private final Runnable onClosed;
    private ResultsLayout resultsLayout;
    private JScrollPane warningsArea;
    private JSplitPane mainSplit;
    private boolean painted;

    /**
     * @param dialogs  how questions are asked; null for ordinary Swing dialogs
     * @param onClosed run after the window closes (the program exits there)
     */
    public MainWindow(OpenDocument document, Settings settings, Dialogs dialogs, Runnable onClosed) {
        super("Barwright");
        this.document = document;
        this.settings = settings;
        this.onClosed = onClosed;
        setName("barwright.main");
        this.view = new ViewSettings(UnitSystem.parse(settings.get("units", "si")), Locale.getDefault(Locale.Category.FORMAT));
        this.files = new FileCommands(document, dialogs != null ? dialogs : new SwingDialogs(this),
                new RecentFiles(settings));
        this.analysis = new AnalysisController(document, results);
        FigureFormat format = new FigureFormat(view);
        editor = new VehicleEditor(document, view);
        figures = new FiguresPanel(results, format, this::showWork);
        tabs = new ResultsTabs(results, probe, format, analysis, files::exportChart,
                (picture, type) -> files.exportPicture("car-from-behind", picture, type));
        WindowContext shared = new WindowContext(this, document, view, files.dialogs(), results);
        contributions = List.of(new InsightViews(shared), new SizingViews(shared), new WorkshopViews(shared),
                new PresentationViews(shared), new LinkageViews(shared, probe), new TyreViews(shared),
                new DynamicsViews(shared));
        for (WindowContribution contribution : contributions) {
            for (WindowContribution.Page page : contribution.pages()) {
                tabs.addTab(page.title(), page.view());
                tabs.setToolTipTextAt(tabs.getTabCount() - 1, page.tooltip());
            }
        }
        setContentPane(new PaintWatchingPanel());
        layoutWindow();
        Menus menus = new Menus(this, contributions);
        setJMenuBar(menus.menuBar());
        getContentPane().add(menus.toolBar(), BorderLayout.NORTH);
        document.addListener(event -> updateTitle());
        updateTitle();
        setDefaultCloseOperation(WindowConstants.DO_NOTHING_ON_CLOSE);
        addWindowListener(new WindowAdapter() {
            @Override
            public void windowClosing(WindowEvent event) {
                close();
            }
        });
        setMinimumSize(new Dimension(960, 640));
        setSize(new Dimension(1280, 880));
        addComponentListener(new java.awt.event.ComponentAdapter() {
            @Override
            public void componentResized(java.awt.event.ComponentEvent event) {
                if (mainSplit.getDividerLocation() > mainSplit.getMinimumDividerLocation()) {
                    fitEditor(); // not when the person has folded the editor away
                }
            }
        });
        analysis.refresh();
    }

    private void layoutWindow() {
        JPanel centre = new JPanel(new BorderLayout());
        centre.setPreferredSize(new Dimension(520, 500));
        centre.setMinimumSize(new Dimension(360, 300));
        centre.add(tabs, BorderLayout.CENTER);
        JScrollPane warnings = new JScrollPane(new WarningsPanel(results)) {
            @Override
            public Dimension getPreferredSize() {
                // two and a half lines of warning at any text size, never less than the 78 px of old
                return new Dimension(400, Math.max(78, lineHeight() * 5 / 2 + 8));
            }
        };
        warnings.setBorder(BorderFactory.createMatteBorder(1, 0, 0, 0,
                UIManager.getColor("Component.borderColor")));
        warningsArea = warnings;
        centre.add(warnings, BorderLayout.SOUTH);

        JPanel right = new PagePanel(new BorderLayout());
        right.add(figures, BorderLayout.NORTH);
        results.addListener(right::revalidate);
        right.add(new CautionNote(), BorderLayout.SOUTH);
        JScrollPane rightScroll = new JScrollPane(right) {
            @Override
            public Dimension getPreferredSize() {
                // as wide as the figures need at the current text size, never narrower than the column
                // (the figures decide it: the caution under them wraps to whatever width it is given)
                int needed = figures.getPreferredSize().width + getVerticalScrollBar().getPreferredSize().width + 6;
                // as high as all the figures, so that below the charts they can be shown whole
                int high = right.getPreferredSize().height + getHorizontalScrollBar().getPreferredSize().height + 6;
                return new Dimension(Math.max(needed, FIGURES_WIDTH * textScale() / 100), high);
            }
        };
        rightScroll.setBorder(BorderFactory.createMatteBorder(1, 1, 0, 0,
                UIManager.getColor("Component.borderColor")));
        // never clip a figure into a different number: scroll sideways when the column is too narrow
        rightScroll.setHorizontalScrollBarPolicy(JScrollPane.HORIZONTAL_SCROLLBAR_AS_NEEDED);
        rightScroll.getVerticalScrollBar().setUnitIncrement(16);
        rightScroll.getHorizontalScrollBar().setUnitIncrement(16);
        rightScroll.setName("figures.scroll");
        ResultsPanel resultsSplit = new ResultsPanel();
        resultsLayout = new ResultsLayout(centre, rightScroll, this::chartsMinimumHeight, this::lineHeight);
        resultsSplit.setLayout(resultsLayout);
        resultsSplit.add(centre);
        resultsSplit.add(rightScroll);
        tabs.addChangeListener(event -> resultsSplit.revalidate()); // the car picture needs more height than a chart
        JScrollPane resultsScroll = new JScrollPane(resultsSplit, JScrollPane.VERTICAL_SCROLLBAR_AS_NEEDED,
                JScrollPane.HORIZONTAL_SCROLLBAR_NEVER);
        resultsScroll.setBorder(null);
        resultsScroll.setName("results.scroll");
        JPanel resultsArea = new JPanel(new BorderLayout());
        resultsArea.add(new StaleBanner(results), BorderLayout.NORTH);
        resultsArea.add(resultsScroll, BorderLayout.CENTER);

        JSplitPane main = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, editor, resultsArea);
        main.setResizeWeight(0);
        main.setOneTouchExpandable(true); // the editor folds away for a class or a small screen
        main.setDividerLocation(editor.getPreferredSize().width);
        main.setBorder(null);
        main.setName("main.split");
        mainSplit = main;
        getContentPane().add(main, BorderLayout.CENTER);
    }

    /**
     * @return the least height of the charts column (pixels): the tab strip, the car picture at its least
     * size with its slider, and the warnings, at the present text size
     */
    private int chartsMinimumHeight() {
        // a chart or a page has no words above its drawing to keep whole: the least drawing height, or twelve
        // lines of text where that is more (a chart's title, axes and legend grow with the text; below that the
        // plot shrank to a sliver at 28 pt), so that the chart, its legend and the warnings stay in view
        int picture = tabs.getSelectedIndex() <= 0 ? tabs.car().getMinimumSize().height
                : Math.max(barwright.ui.panel.CarBehindView.DRAWING_LEAST_HEIGHT, 12 * lineHeight());
        return tabs.pictureOverhead() + picture + warningsArea.getPreferredSize().height;
    }

    /** @return the height of a line of text at the present text size (pixels) */
    private int lineHeight() {
        return getFontMetrics(UIManager.getFont("Label.font")).getHeight();
    }

    private void showWork(KeyFigure figure) {
        var shown = results.shown();
        if (shown != null && shown.result() != null) {
            WorkDialog.show(this, shown.result(), figure, view, results.isStale());
        }
    }

    void updateTitle() {
        String name = document.displayName();
        setTitle(document.isDirty() ? name + " \u2022 unsaved changes \u2014 Barwright" : name + " \u2014 Barwright");
        getRootPane().putClientProperty("Window.documentModified", document.isDirty());
    }

    /** Closes the window unless the person cancels at the unsaved-changes question. */
    public void close() {
        if (files.mayDiscard()) {
            dispose();
            onClosed.run();
        }
    }

    /** Switches every field, figure, chart and export to the unit system, and remembers the choice. */
    public void setUnits(UnitSystem units) {
        settings.put("units", units.name().toLowerCase(Locale.ROOT));
        view.setUnits(units);
    }

    /** Applies the theme and text size settings to this window. */
    void applyLook() {
        Themes.apply(theme(), textSize());
        tabs.restyle();
        fitEditor();
        repaint();
    }

    /**
     * Gives the editor room for its labels and fields whole at the current text size, but never so much that
     * the results get less than {@link #RESULTS_LEAST_WIDTH}: past that the editor scrolls sideways.
     */
    void fitEditor() {
        int wanted = Math.max(VehicleEditor.WIDTH * textScale() / 100, editor.neededWidth());
        // and never more than EDITOR_MOST_SHARE of the window: on a projector at 1024x768 with a large text the
        // charts and pages then keep some 600 px of width (the editor's labels go above their fields, Form)
        int allowed = Math.max(VehicleEditor.WIDTH, Math.min(getWidth() - RESULTS_LEAST_WIDTH,
                (int) Math.round(getWidth() * EDITOR_MOST_SHARE)));
        // where the editor at its usual width still leaves room for the figures beside the charts, keep them
        // there: the editor's labels then go above their fields (Form) rather than push the figures below
        // (at the system text size only: with larger text the figures go below on any screen this fits)
        int besideLeaves = getWidth() - resultsLayout.widthForBeside() - mainSplit.getDividerSize() - 4;
        if (textScale() == 100 && besideLeaves >= VehicleEditor.WIDTH) {
            allowed = Math.min(allowed, besideLeaves);
        }
        mainSplit.setDividerLocation(Math.min(wanted, allowed));
        mainSplit.revalidate();
    }

    /** @return whether the key figures are beside the charts (false: below them, as on a small screen) */
    public boolean figuresBeside() {
        return resultsLayout.beside();
    }

    /** @return the text size as a percentage of the system's */
    private int textScale() {
        int size = textSize();
        return size > 0 ? Math.max(100, size * 100 / Themes.systemTextSize()) : 100;
    }

    Themes.Theme theme() {
        return "dark".equals(settings.get("theme", "light")) ? Themes.Theme.DARK : Themes.Theme.LIGHT;
    }

    int textSize() {
        try {
            return Integer.parseInt(settings.get("textSize", "0"));
        } catch (NumberFormatException notANumber) {
            return 0;
        }
    }

    /** Runs once the window has first been painted (the start-up benchmark's mark). */
    public void whenFirstPainted(Runnable action) {
        if (painted) {
            action.run();
        } else {
            firstPaint.add(action);
        }
    }

    private final class PaintWatchingPanel extends JPanel {
        PaintWatchingPanel() {
            super(new BorderLayout());
        }

        @Override
        public void paint(Graphics graphics) {
            super.paint(graphics);
            if (!painted) {
                painted = true;
                firstPaint.forEach(Runnable::run);
                firstPaint.clear();
            }
        }
    }

    public OpenDocument document() {
        return document;
    }

    public Settings settings() {
        return settings;
    }

    public ViewSettings view() {
        return view;
    }

    public ResultsModel results() {
        return results;
    }

    public AnalysisController analysis() {
        return analysis;
    }

    public FileCommands files() {
        return files;
    }

    public FiguresPanel figures() {
        return figures;
    }

    public ResultsTabs tabs() {
        return tabs;
    }

    public VehicleEditor editor() {
        return editor;
    }

    public CorneringProbe probe() {
        return probe;
    }

    /** @return the contribution of this type that the window was built with (the views' own tests reach it so) */
    public <T extends WindowContribution> T contribution(Class<T> type) {
        for (WindowContribution contribution : contributions) {
            if (type.isInstance(contribution)) {
                return type.cast(contribution);
            }
        }
        throw new IllegalArgumentException("the main window has no " + type.getSimpleName());
    }
}
