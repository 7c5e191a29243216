package barwright.architecture;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The table of packages in DEVELOPERS.md ("Layout"), read as the rules the architecture test enforces, so that
 * the table and the test cannot drift apart. A row names one or more packages in its first column and the
 * packages they may use in its third, each as a code span: {@code `barwright.physics`} is that package alone,
 * {@code `barwright.sizing.*`} the package and every package under it; in the third column the names leave
 * out {@code barwright.} ({@code `model`}, {@code `physics.*`}). Every package may use itself.
 */
record PackageTable(List<Row> rows) {
    private static final String ROOT = "barwright";
    private static final Pattern CODE_SPAN = Pattern.compile("`([^`]*)`");
    private static final Pattern PACKAGE_NAME = Pattern.compile("[a-z][a-z0-9]*(\\.[a-z][a-z0-9]*)*(\\.\\*)?");

    /** A third column may end with "(not yet enforced: why)": the rule is written but main still breaks it. */
    private static final Pattern NOT_YET = Pattern.compile("\\(not yet enforced: ([^)]*)\\)");

    /**
     * @param packages   the packages the row is about, full names, each maybe ending in ".*"
     * @param mayUse     the packages they may use, full names, each maybe ending in ".*"
     * @param notYet     why the row is not yet enforced (main still breaks it), or null where it is
     */
    record Row(List<String> packages, List<String> mayUse, String notYet) {
    }

    /** @return the table of the "Layout" section of that DEVELOPERS.md */
    static PackageTable read(Path developersGuide) throws IOException {
        List<Row> rows = new ArrayList<>();
        boolean inLayout = false;
        for (String line : Files.readAllLines(developersGuide)) {
            if (line.startsWith("## ")) {
                inLayout = line.trim().equals("## Layout");
                continue;
            }
            if (!inLayout || !line.startsWith("| `" + ROOT)) {
                continue;
            }
            String[] cells = line.split("\\|");
            if (cells.length < 4) {
                throw new IllegalStateException("DEVELOPERS.md, Layout: a row without three columns: " + line);
            }
            List<String> packages = spans(cells[1], "");
            String uses = cells[cells.length - 1];
            Matcher notYet = NOT_YET.matcher(uses);
            String pending = notYet.find() ? notYet.group(1).trim() : null;
            List<String> mayUse = spans(notYet.replaceAll(""), ROOT + ".");
            rows.add(new Row(packages, mayUse, pending));
        }
        if (rows.isEmpty()) {
            throw new IllegalStateException("DEVELOPERS.md has no package table under \"## Layout\"");
        }
        return new PackageTable(List.copyOf(rows));
    }

    private static List<String> spans(String cell, String prefix) {
        List<String> names = new ArrayList<>();
        Matcher matcher = CODE_SPAN.matcher(cell);
        while (matcher.find()) {
            String name = matcher.group(1).trim();
            if (!PACKAGE_NAME.matcher(name).matches()) {
                throw new IllegalStateException("DEVELOPERS.md, Layout: `" + name + "` is not a package name");
            }
            names.add(prefix + name);
        }
        return names;
    }

    /**
     * @return the row that governs a package: one naming it exactly, else the one whose ".*" name is its
     *     nearest enclosing package
     */
    Optional<Row> rowFor(String packageName) {
        for (Row row : rows) {
            if (row.packages().contains(packageName)) {
                return Optional.of(row);
            }
        }
        return rows.stream()
                .flatMap(row -> row.packages().stream().filter(name -> covers(name, packageName))
                        .map(name -> new Object[] {name, row}))
                .max(Comparator.comparingInt(pair -> ((String) pair[0]).length()))
                .map(pair -> (Row) pair[1]);
    }

    /** @return the ArchUnit package patterns a package may depend on: itself and its row's list */
    static Set<String> allowedPatterns(String packageName, Row row) {
        Set<String> patterns = new LinkedHashSet<>();
        patterns.add(packageName);
        for (String name : row.mayUse()) {
            patterns.add(pattern(name));
        }
        return patterns;
    }

    /** @return "a.b.." for "a.b.*" (the package and those under it), else the name itself (that package only) */
    static String pattern(String name) {
        return name.endsWith(".*") ? name.substring(0, name.length() - 2) + ".." : name;
    }

    private static boolean covers(String name, String packageName) {
        if (!name.endsWith(".*")) {
            return false;
        }
        String base = name.substring(0, name.length() - 2);
        return packageName.equals(base) || packageName.startsWith(base + ".");
    }
}
