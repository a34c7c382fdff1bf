package org.meridian.spline;

import java.util.ArrayList;
import java.util.List;
import org.meridian.core.ChannelPlacement;
import org.meridian.core.Montage;
import org.meridian.core.Study;
import org.meridian.core.Unit;
import org.meridian.core.Waveforms;

/**
 * The current source density (CSD = −∇²V, µV/m²) of every waveform of a study at its own
 * electrodes, from one spherical spline fitted to the study's positioned channels
 * ({@link SphericalSpline}, Perrin et al., 1989). The spline depends only on the montage, so
 * the N × N map from potentials to CSD is formed once and each waveform is one matrix product.
 *
 * <p>Unpositioned channels (an EOG channel, say) have no place on the scalp: they take no part
 * in the fit and are left out of the result, which keeps only the positioned channels, in
 * montage order, with the unit µV/m².
 */
public final class SurfaceLaplacian {
    private final SphericalSpline spline;
    private final ChannelTransform transform;

    public SurfaceLaplacian(Montage montage, SplineParameters parameters) {
        this.spline = SphericalSpline.fit(montage, parameters);
        this.transform = spline.transformAt(Quantity.CSD, montage.electrodes());
    }

    public SphericalSpline spline() {
        return spline;
    }

    /** The CSD of one set of potential waveforms (µV) at the montage's electrodes. */
    public Waveforms of(Waveforms potentials) {
        Unit unit = Quantity.CSD.outputUnit(potentials.unit());
        float[] out = transform.apply(potentials, spline.rowsIn(potentials));
        return Waveforms.wrap(spline.labels(), potentials.axis(), unit, out);
    }

    /** The CSD of every cell of a study (potentials in µV), as a study of its own. */
    public static Study of(Study study, SplineParameters parameters) {
        Quantity.CSD.outputUnit(study.unit());
        SurfaceLaplacian csd = new SurfaceLaplacian(study.montage(), parameters);
        List<ChannelPlacement> kept = new ArrayList<>();
        for (ChannelPlacement p : study.placements()) {
            if (p.positioned()) {
                kept.add(p);
            }
        }
        Study.Builder b = Study.builder(study.name() + " (CSD)").montage(study.montage()).placements(kept);
        for (int p = 0; p < study.participants().size(); p++) {
            for (int c = 0; c < study.conditions().size(); c++) {
                b.add(study.participants().get(p), study.conditions().get(c),
                        csd.of(study.waveforms(p, c)), study.trials(p, c).orElse(-1));
            }
        }
        return b.build();
    }
}
