package barwright.measure;

/** What a reading was used for in a fit. */
public enum ReadingRole {
    /** on the line: used in the fit */
    FITTED("fitted"),
    /** taken up in the free play (load under the free-play threshold): left out of the fit */
    FREE_PLAY("free play"),
    /** far off the line by the outlier rule: flagged and left out of the fit */
    OUTLIER("outlier");

    private final String words;

    ReadingRole(String words) {
        this.words = words;
    }

    /** @return the role in words, as reports show it */
    public String words() {
        return words;
    }
}
