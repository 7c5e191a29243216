package barwright.io;

import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** The guard every JSON text passes before it is written (RFC 8259 section 6: JSON has no NaN or Infinity). */
class FiniteNumbersTest {
    @Test
    void aNonFiniteNumberAnywhereStopsTheWriteAndNamesItsKeyPath() {
        ObjectNode report = JsonNodeFactory.instance.objectNode();
        report.put("limitG", 1.02);
        report.putObject("front").putArray("barBushingLoadsN").add(812.0).add(Double.POSITIVE_INFINITY);
        assertThatThrownBy(() -> VehicleFileWriter.toJson(report))
                .isInstanceOf(IllegalStateException.class)
                .hasMessageContaining("nothing was written")
                .hasMessageContaining("front.barBushingLoadsN[1]");
        report.put("limitG", Double.NaN);
        assertThatThrownBy(() -> VehicleFileWriter.toJson(report)).hasMessageContaining("at limitG");
    }

    @Test
    void finiteNumbersAndNullsPass() {
        ObjectNode report = JsonNodeFactory.instance.objectNode();
        report.put("limitG", Double.MAX_VALUE).put("least", -Double.MIN_VALUE).putNull("frontInsideLiftG");
        assertThat(VehicleFileWriter.toJson(report)).contains("limitG").doesNotContain("NaN").doesNotContain("Infinity");
    }
}
