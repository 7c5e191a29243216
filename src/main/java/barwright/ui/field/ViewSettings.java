package barwright.ui.field;

import barwright.units.UnitSystem;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;

/** How figures are shown: the unit system and the locale numbers are written and read in. Event thread. */
public final class ViewSettings {
    private final List<Runnable> listeners = new ArrayList<>();
    private UnitSystem units;
    private final Locale locale;

    public ViewSettings(UnitSystem units, Locale locale) {
        this.units = Objects.requireNonNull(units);
        this.locale = Objects.requireNonNull(locale);
    }

    public UnitSystem units() {
        return units;
    }

    public Locale locale() {
        return locale;
    }

    public void setUnits(UnitSystem newUnits) {
        if (newUnits != units) {
            units = newUnits;
            List.copyOf(listeners).forEach(Runnable::run);
        }
    }

    public void addListener(Runnable listener) {
        listeners.add(listener);
    }

    public void removeListener(Runnable listener) {
        listeners.remove(listener);
    }
}
