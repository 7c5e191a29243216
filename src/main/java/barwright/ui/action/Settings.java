package barwright.ui.action;

/** What the program remembers between runs: units, theme, text size, recent files. */
public interface Settings {
    String get(String key, String fallback);

    void put(String key, String value);

    /** @return settings kept in the user's preferences store */
    static Settings preferences() {
        java.util.prefs.Preferences node = java.util.prefs.Preferences.userRoot().node("barwright");
        return new Settings() {
            @Override
            public String get(String key, String fallback) {
                return node.get(key, fallback);
            }

            @Override
            public void put(String key, String value) {
                node.put(key, value);
            }
        };
    }

    /** @return settings held in memory only (tests, screenshots) */
    static Settings inMemory() {
        java.util.Map<String, String> values = new java.util.HashMap<>();
        return new Settings() {
            @Override
            public String get(String key, String fallback) {
                return values.getOrDefault(key, fallback);
            }

            @Override
            public void put(String key, String value) {
                values.put(key, value);
            }
        };
    }
}
