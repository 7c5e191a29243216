package barwright.cli;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Mutated sample files through the {@code analyze} command (FuzzCampaign): every case is refused with a key
 * path, a line and column or a stated cause, or analysed with every figure finite; never an internal
 * failure. 2,000 cases by default (under a minute here); {@code -Dfuzz.cases=10000} runs the campaign
 * whose figures DEVELOPERS.md quotes, {@code -Dfuzz.seed=N} starts elsewhere.
 */
class VehicleFileFuzzTest {
    @Test
    void mutatedSampleFilesAreRefusedWithAPlaceOrAnalysedWithFiniteFigures(@TempDir Path work) {
        int cases = Integer.getInteger("fuzz.cases", 2000);
        long seed = Long.getLong("fuzz.seed", 1L);
        FuzzCampaign.Counts counts = FuzzCampaign.run(seed, cases, work);
        System.out.println("fuzz campaign from seed " + seed + ": " + counts);
        assertThat(counts.defectCases()).as(counts.toString()).isEmpty();
        assertThat(counts.defects()).isZero();
        assertThat(counts.refused() + counts.analysed()).isEqualTo(cases);
        // a campaign that only ever refused would test nothing of the analysis: the mutations keep about one
        // file in six analysable (measured, DEVELOPERS.md)
        assertThat(counts.analysed()).isGreaterThan(cases / 20);
    }
}
