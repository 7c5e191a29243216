package barwright.io;

import com.fasterxml.jackson.databind.node.IntNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

class KeyPathTest {
    private final ObjectNode tree = JsonNodeFactory.instance.objectNode();

    @Test
    void readsAndWritesNestedKeysAndListEntriesAsTheCoreNamesThem() {
        KeyPath wall = KeyPath.of("front.bar.section.wallMm");
        wall.set(tree, IntNode.valueOf(3));
        assertThat(tree.at("/front/bar/section/wallMm").intValue()).isEqualTo(3);
        assertThat(wall.get(tree).intValue()).isEqualTo(3);
        assertThat(wall.lastKey()).isEqualTo("wallMm");

        KeyPath hole = KeyPath.of("front.bar.armLengthsMm[2]");
        hole.set(tree, IntNode.valueOf(230));
        assertThat(tree.at("/front/bar/armLengthsMm").size()).isEqualTo(3);
        assertThat(hole.get(tree).intValue()).isEqualTo(230);
        assertThat(KeyPath.of("front.bar").child("armLengthsMm").index(2)).isEqualTo(hole);
    }

    @Test
    void aMissingStepReadsAsNullAndRemoveTakesTheKeyAway() {
        assertThat(KeyPath.of("rear.bar.section.wallMm").get(tree)).isNull();
        KeyPath span = KeyPath.of("front.bar.bushingSpanMm");
        span.set(tree, IntNode.valueOf(700));
        span.remove(tree);
        assertThat(tree.at("/front/bar").has("bushingSpanMm")).isFalse();
    }

    @Test
    void refusesTextThatIsNotAKeyPath() {
        assertThatThrownBy(() -> KeyPath.of("front..bar")).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> KeyPath.of("front.bar[x]")).isInstanceOf(IllegalArgumentException.class);
    }
}
