package aequa.planar;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;

import aequa.ellipsoid.GeodesicArea;
import aequa.inputs.regions.Region;
import aequa.projection.Projections;

class AreaAuditorTest {

    @Test
    void usStatesUnderLambertAzimuthalKeepTheirAreas() {
        // us-states-2017.geojson (US Census 2017 via npm us-atlas 3.0.1), LAEA (EPSG method 9820, through SIS)
        // centred on the conterminous states. The bar: every map's relative area error < 1e-4.
        double stepDeg = 0.05;
        List<Region> states = PlanarFixtures.load("us-states-2017.geojson", stepDeg);
        PolygonProjector projector = new PolygonProjector(Projections.lambertAzimuthal(-98.5, 39.5), stepDeg);
        List<RegionAreaCheck> checks = new ArrayList<>();
        for (Region state : states) {
            checks.add(AreaAuditor.check(state.key(), GeodesicArea.areaKm2(state.lonLat()), projector.project(state.lonLat())));
        }
        AreaAudit audit = AreaAuditor.audit(checks, 1e-4);
        assertTrue(audit.maxRelativeError() < 1e-4, audit.toString());
        assertTrue(audit.passed());
        // Texas (48): US Census gives 695,662 km2 total area (land and water); the 1:10m outline follows the
        // coast, so only the order of magnitude is checked here: within 2 %
        RegionAreaCheck texas = checks.stream().filter(c -> c.key().equals("48")).findFirst().orElseThrow();
        assertEquals(695_662, texas.geodesicAreaKm2(), 0.02 * 695_662);
    }

    @Test
    void theWorstRegionIsNamedAndNanFails() {
        AreaAudit audit = AreaAuditor.audit(List.of(
                new RegionAreaCheck("a", 100, 100.001),
                new RegionAreaCheck("b", 100, 99.98),
                new RegionAreaCheck("c", 100, 100)), 1e-4);
        assertEquals("b", audit.worstKey());
        assertEquals(2e-4, audit.maxRelativeError(), 1e-12);
        assertFalse(audit.passed());
        AreaAudit broken = AreaAuditor.audit(List.of(new RegionAreaCheck("z", 0, 5)), 1e-4);
        assertEquals("z", broken.worstKey());
        assertFalse(broken.passed());
    }
}
