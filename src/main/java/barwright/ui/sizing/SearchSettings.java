package barwright.ui.sizing;

import barwright.model.AxlePosition;
import barwright.model.Material;

import java.util.List;

/**
 * What the search form holds, in SI, before it is checked against the car: the plain values a person chose.
 *
 * @param axles            the bars to size: front, rear, or both
 * @param share            how a front share is aimed at
 * @param shareValue       the front share (a fraction) or the offset from the static front weight (a fraction),
 *                         as {@code share} says; null with {@link ShareAim#NONE}
 * @param rollGradient     the roll gradient aimed at (rad s^2/m), or null for none
 * @param minSafetyFactor  the least static safety factor at the check travel
 * @param frontStaysDown   the inside front wheel must stay down up to the limit
 * @param rearStaysDown    the inside rear wheel must stay down up to the limit
 * @param maxBarMass       the heaviest bar allowed (kg), or null for no limit
 * @param maxOuterDiameter the largest outside diameter allowed (m), or null for no limit
 * @param ownMaterial      try each bar in its own material
 * @param materials        further materials to try
 * @param catalogues       built-in catalogue names, or paths of catalogue files
 * @param tubeDiameter     a tube outside diameter (m) for which the exact wall is wanted, or null
 * @param count            how many of the best results to list
 */
record SearchSettings(List<AxlePosition> axles, ShareAim share, Double shareValue, Double rollGradient,
                      double minSafetyFactor, boolean frontStaysDown, boolean rearStaysDown, Double maxBarMass,
                      Double maxOuterDiameter, boolean ownMaterial, List<Material> materials, List<String> catalogues,
                      Double tubeDiameter, int count) {
    /** How the front share is aimed at. */
    enum ShareAim {
        NONE, SHARE, OFFSET_FROM_STATIC
    }

    SearchSettings {
        axles = List.copyOf(axles);
        materials = List.copyOf(materials);
        catalogues = List.copyOf(catalogues);
    }
}
