package barwright.ui.panel;

/** Help texts shown on hover, wrapped to a readable width. */
final class Tooltips {
    private Tooltips() {
    }

    /** @return HTML text wrapped at about this many pixels */
    static String wrap(String text, int width) {
        return "<html><body style='width:" + width + "px'>" + escape(text) + "</body></html>";
    }

    /** @return a field's tooltip: its name and unit, what it is and how to measure it, its key, any problem */
    static String field(String label, String unit, String help, String key, String problem) {
        StringBuilder html = new StringBuilder("<html><body style='width:320px'><b>").append(escape(label))
                .append("</b>");
        if (!unit.isEmpty()) {
            html.append(" (").append(escape(unit)).append(')');
        }
        html.append("<br>").append(escape(help));
        html.append("<br><font color='gray'>File key: ").append(escape(key)).append("</font>");
        if (problem != null) {
            html.append("<br><b>Refused:</b> ").append(escape(problem));
        }
        return html.append("</body></html>").toString();
    }

    static String escape(String text) {
        return text.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
    }
}
