package barwright.io.csv;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.io.RandomAccessFile;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** The general CSV reader (file-format.md, "CSV files"): what it accepts, and every refusal naming its line. */
class CsvReaderTest {
    private static final CsvSchema SCHEMA = new CsvSchema(List.of("loadN", "slipAngleDeg", "lateralForceN"),
            List.of("camberDeg"));

    @Test
    void readsNumbersCommentsQuotesAndAByteOrderMark() throws CsvFileException {
        String text = "\uFEFF# invented test data\r\n"
                + "loadN,slipAngleDeg,lateralForceN,camberDeg,note\r\n"
                + "4000,1.5,2100.5,,\"first, with a comma\"\r\n"
                + "\r\n"
                + "4000,-2e0,-2750,-2,\"say \"\"hi\"\"\"\r\n";
        CsvTable table = CsvReader.parse(text, SCHEMA);
        assertThat(table.columns()).containsExactly("loadN", "slipAngleDeg", "lateralForceN", "camberDeg", "note");
        assertThat(table.rows()).hasSize(2);
        CsvRow first = table.rows().get(0);
        assertThat(first.line()).isEqualTo(3);
        assertThat(first.number("lateralForceN")).isEqualTo(2100.5);
        assertThat(first.optionalNumber("camberDeg")).isEmpty();
        assertThat(first.text("note")).isEqualTo("first, with a comma");
        CsvRow second = table.rows().get(1);
        assertThat(second.line()).isEqualTo(5);
        assertThat(second.number("slipAngleDeg")).isEqualTo(-2);
        assertThat(second.optionalNumber("camberDeg")).hasValue(-2);
        assertThat(second.text("note")).isEqualTo("say \"hi\"");
    }

    @Test
    void badCellsAreRefusedWithLineAndColumnAndAllAreListed() {
        String text = "loadN,slipAngleDeg,lateralForceN\n"
                + "4000,1,NaN\n"
                + "4000,Infinity,100\n"
                + "4000,two,100\n"
                + "4000,,100\n"
                + "4000,1\n"
                + "0x10,1,100\n";
        assertThatThrownBy(() -> CsvReader.parse(text, SCHEMA)).isInstanceOf(CsvFileException.class)
                .satisfies(e -> assertThat(((CsvFileException) e).problems()).containsExactly(
                        "line 2, column lateralForceN = \"NaN\": must be a finite number written with a decimal "
                                + "point (like 1250 or -3.5e2)",
                        "line 3, column slipAngleDeg = \"Infinity\": must be a finite number written with a decimal "
                                + "point (like 1250 or -3.5e2)",
                        "line 4, column slipAngleDeg = \"two\": must be a finite number written with a decimal "
                                + "point (like 1250 or -3.5e2)",
                        "line 5, column slipAngleDeg: the cell is empty; a number is required",
                        "line 6 has 2 cells: the header has 3 columns",
                        "line 7, column loadN = \"0x10\": must be a finite number written with a decimal point "
                                + "(like 1250 or -3.5e2)"));
    }

    @Test
    void aHugeExponentThatOverflowsIsRefused() {
        assertThatThrownBy(() -> CsvReader.parse("loadN,slipAngleDeg,lateralForceN\n1e400,1,1\n", SCHEMA))
                .hasMessageContaining("line 2, column loadN = \"1e400\": must be a finite number");
    }

    @Test
    void aMissingColumnIsNamedWithWhatTheFileHas() {
        assertThatThrownBy(() -> CsvReader.parse("loadN,slip,lateralForceN\n1,2,3\n", SCHEMA))
                .hasMessage("line 1 (the header): the column \"slipAngleDeg\" is missing; the file needs loadN, "
                        + "slipAngleDeg, lateralForceN (and may have camberDeg), and has loadN, slip, lateralForceN");
    }

    @Test
    void emptyHeaderOnlyDuplicateColumnsAndOpenQuotesAreRefused() {
        assertThatThrownBy(() -> CsvReader.parse("# nothing\n\n", SCHEMA)).hasMessageContaining("no header row");
        assertThatThrownBy(() -> CsvReader.parse("loadN,slipAngleDeg,lateralForceN\n", SCHEMA))
                .hasMessage("the file has a header but no data rows");
        assertThatThrownBy(() -> CsvReader.parse("loadN,loadN,slipAngleDeg,lateralForceN\n1,1,1,1\n", SCHEMA))
                .hasMessageContaining("column \"loadN\" appears twice");
        assertThatThrownBy(() -> CsvReader.parse("loadN,slipAngleDeg,lateralForceN\n1,\"2,3\n", SCHEMA))
                .hasMessage("line 2: a quoted cell is not closed (a \" is missing)");
    }

    @Test
    void problemsPastTwentyAreCounted() {
        StringBuilder text = new StringBuilder("loadN,slipAngleDeg,lateralForceN\n");
        for (int i = 0; i < 25; i++) {
            text.append("x,1,1\n");
        }
        assertThatThrownBy(() -> CsvReader.parse(text.toString(), SCHEMA))
                .satisfies(e -> assertThat(((CsvFileException) e).problems()).hasSize(21)
                        .last().isEqualTo("... and 5 more problems"));
    }

    @Test
    void aFileOverTheSizeLimitIsRefusedBeforeReading(@TempDir Path directory) throws IOException {
        Path big = directory.resolve("big.csv");
        try (RandomAccessFile file = new RandomAccessFile(big.toFile(), "rw")) {
            file.setLength(CsvReader.MAX_BYTES + 1); // sparse: nothing is written
        }
        assertThatThrownBy(() -> CsvReader.read(big, SCHEMA)).hasMessageContaining("a CSV file must be under 16 MB");
        assertThatThrownBy(() -> CsvReader.read(directory.resolve("none.csv"), SCHEMA))
                .hasMessageContaining("file not found");
        Files.delete(big);
    }
}
