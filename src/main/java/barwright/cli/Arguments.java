package barwright.cli;

import barwright.units.UnitSystem;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The arguments of one command: positional values, switches ({@code --json}) and options with a value
 * ({@code --units us} or {@code --units=us}). Anything not declared is refused with a message.
 */
public final class Arguments {
    private final List<String> positional = new ArrayList<>();
    private final Set<String> switches = new HashSet<>();
    private final Map<String, String> options = new HashMap<>();

    private Arguments() {
    }

    /**
     * @param declaredSwitches option names without a value, e.g. "json"
     * @param declaredOptions  option names that take a value, e.g. "units"
     */
    public static Arguments parse(List<String> args, Set<String> declaredSwitches, Set<String> declaredOptions)
            throws UsageException {
        Arguments parsed = new Arguments();
        for (int i = 0; i < args.size(); i++) {
            String arg = args.get(i);
            if (!arg.startsWith("--")) {
                parsed.positional.add(arg);
                continue;
            }
            String name = arg.substring(2);
            String value = null;
            int equals = name.indexOf('=');
            if (equals >= 0) {
                value = name.substring(equals + 1);
                name = name.substring(0, equals);
            }
            if (declaredSwitches.contains(name) && value == null) {
                parsed.switches.add(name);
            } else if (declaredOptions.contains(name)) {
                if (value == null) {
                    if (i + 1 >= args.size()) {
                        throw new UsageException("--" + name + " needs a value");
                    }
                    value = args.get(++i);
                }
                parsed.options.put(name, value);
            } else {
                throw new UsageException("unknown option " + arg);
            }
        }
        return parsed;
    }

    public List<String> positional() {
        return positional;
    }

    /** @return the single positional argument (a file), refusing none or more than one */
    public String onlyPositional(String what) throws UsageException {
        if (positional.size() != 1) {
            throw new UsageException("give exactly one " + what + (positional.isEmpty() ? "" : ", not " + positional.size()));
        }
        return positional.get(0);
    }

    public boolean has(String switchName) {
        return switches.contains(switchName);
    }

    public String option(String name, String fallback) {
        return options.getOrDefault(name, fallback);
    }

    /** @return the number given for an option, or the fallback */
    public double number(String name, double fallback) throws UsageException {
        String text = options.get(name);
        if (text == null) {
            return fallback;
        }
        try {
            double value = Double.parseDouble(text);
            if (!Double.isFinite(value)) {
                throw new NumberFormatException();
            }
            return value;
        } catch (NumberFormatException notANumber) {
            throw new UsageException("--" + name + " = " + text + ": must be a number");
        }
    }

    /** @return the unit system of {@code --units si|us}, SI by default */
    public UnitSystem units() throws UsageException {
        try {
            return UnitSystem.parse(option("units", "si"));
        } catch (IllegalArgumentException bad) {
            throw new UsageException(bad.getMessage());
        }
    }
}
