package org.shutline.io.sample;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Point;
import org.shutline.io.WriteLayer;
import org.shutline.model.ContextLayer;
import org.shutline.model.Main;
import org.shutline.model.MainStatus;
import org.shutline.model.Network;
import org.shutline.model.Operability;
import org.shutline.model.SenseTap;
import org.shutline.model.Service;
import org.shutline.model.ServiceClass;
import org.shutline.model.Station;
import org.shutline.model.TapDevice;
import org.shutline.model.Valve;
import org.shutline.model.ValveKind;

/** The sample town: determinism, the counts the demo needs, its connectivity, and its deliberate flaws. */
class SampleTownTest {
    static final GeneratedTown TOWN = SampleTown.generate(SampleTown.DEFAULT_SEED);
    static final Network N = TOWN.network();
    static final GeometryFactory GF = new GeometryFactory();

    @TempDir Path dir;

    static Main main(String id) {
        return N.mains().stream().filter(m -> m.id().equals(id)).findFirst().orElseThrow();
    }

    static double nearestMain(Geometry g, String system, String except) {
        return N.mains().stream().filter(m -> system == null || m.systemId().equals(system))
            .filter(m -> !m.id().equals(except)).mapToDouble(m -> m.geometry().distance(g)).min().orElse(1e9);
    }

    static Point pt(Coordinate c) {
        return GF.createPoint(c);
    }

    @Test
    void sameSeedSameNetworkOtherSeedOther() {
        assertThat(SampleTown.generate(SampleTown.DEFAULT_SEED).network()).isEqualTo(N);
        assertThat(SampleTown.generate(7).network()).isNotEqualTo(N);
    }

    @Test
    void sameSeedSameShapefileBytes() throws Exception {
        TOWN.writeShapefiles(dir.resolve("a"), org.shutline.model.Progress.NONE);
        SampleTown.generate(SampleTown.DEFAULT_SEED).writeShapefiles(dir.resolve("b"), org.shutline.model.Progress.NONE);
        for (String layer : List.of("mains", "valves", "services", "stations", "sense_taps", "sources", "streets")) {
            for (String ext : List.of("shp", "shx", "prj")) {
                assertThat(Files.readAllBytes(dir.resolve("a").resolve(layer + "." + ext)))
                    .as(layer + "." + ext).isEqualTo(Files.readAllBytes(dir.resolve("b").resolve(layer + "." + ext)));
            }
        }
    }

    /** The committed sample files are what the generator writes today (regenerate them when it changes). */
    @Test
    void committedSampleShapefilesAreCurrent() throws Exception {
        Path committed = Path.of("sample-gis", "tallowmere-shp");
        org.junit.jupiter.api.Assumptions.assumeTrue(Files.isDirectory(committed), "sample-gis not present: skipped");
        TOWN.writeShapefiles(dir.resolve("now"), org.shutline.model.Progress.NONE);
        for (String layer : List.of("mains", "valves", "services", "stations", "sense_taps", "sources", "streets")) {
            for (String ext : List.of("shp", "shx", "prj", "cpg")) {
                assertThat(Files.readAllBytes(committed.resolve(layer + "." + ext))).as(layer + "." + ext
                    + " differs: run ./shutline generate sample-gis/tallowmere-shp (and .gpkg)")
                    .isEqualTo(Files.readAllBytes(dir.resolve("now").resolve(layer + "." + ext)));
            }
        }
        assertThat(Files.size(Path.of("sample-gis", "tallowmere.gpkg"))).isGreaterThan(100_000);
    }

    /** GDAL's ogrinfo sees the raw misspelt word and the CRS in both committed files. */
    @Test
    void committedFilesCarryTheRawWordInGdal() throws Exception {
        Path ogrinfo = Path.of("/usr/bin/ogrinfo");
        org.junit.jupiter.api.Assumptions.assumeTrue(Files.isExecutable(ogrinfo), "ogrinfo not installed: skipped");
        for (String f : List.of("sample-gis/tallowmere.gpkg", "sample-gis/tallowmere-shp")) {
            Process p = new ProcessBuilder(ogrinfo.toString(), "-ro", "-al", f, "mains", "-where",
                "main_id = '" + SampleTown.MISSPELT_MAIN + "'").redirectErrorStream(true).start();
            String out = new String(p.getInputStream().readAllBytes());
            assertThat(p.waitFor()).as(out).isZero();
            assertThat(out).as(f).contains("Feature Count: 1", "status (String) = actve", "UTM zone 15N");
        }
    }

    @Test
    void countsTheDemoNeeds() {
        assertThat(N.services()).hasSizeBetween(1400, 1600);
        assertThat(N.valves()).hasSizeBetween(55, 65);
        assertThat(N.stations()).hasSizeGreaterThanOrEqualTo(3);
        assertThat(N.sources()).hasSize(2).allMatch(s -> s.systemId().equals("IP-1") && s.kpa() == 400.0);
        assertThat(N.mains().stream().map(Main::systemId).collect(Collectors.toSet()))
            .containsExactlyInAnyOrder("IP-1", "LP-NORTH", "LP-SOUTH", "LP-EAST");
        assertThat(N.crs().epsg()).isEqualTo(32615);
        assertThat(N.context()).extracting(ContextLayer::name).containsExactly("streets");
    }

    @Test
    void stationsFeedEveryDistrictAndOneDistrictTwice() {
        Map<String, Long> perDistrict = N.stations().stream()
            .collect(Collectors.groupingBy(Station::outSys, Collectors.counting()));
        assertThat(perDistrict).containsKeys("LP-NORTH", "LP-SOUTH", "LP-EAST");
        assertThat(perDistrict.get("LP-NORTH")).isEqualTo(2);
        assertThat(N.stations()).anyMatch(Station::hasSecondaryProtection)
            .anyMatch(s -> !s.hasSecondaryProtection());
        for (Station s : N.stations()) {
            assertThat(nearestMain(s.geometry(), s.inSys(), null)).as(s.id()).isLessThanOrEqualTo(2.0);
            assertThat(nearestMain(s.geometry(), s.outSys(), null)).as(s.id()).isLessThanOrEqualTo(2.0);
            // an inlet valve of kind station on the inlet system within the 2 m point tolerance
            assertThat(N.valves()).as(s.id()).anyMatch(v -> v.kind() == ValveKind.STATION
                && v.systemId().equals(s.inSys()) && v.geometry().distance(s.geometry()) <= 2.0);
            long taps = N.taps().stream().filter(t -> t.stationId().equals(s.id())).count();
            assertThat(taps).as(s.id()).isBetween(1L, 2L);
        }
    }

    @Test
    void sensingTapsLieOnOutletMainsAndOneIsOnTheCastIronMain() {
        for (SenseTap t : N.taps()) {
            Station s = N.stations().stream().filter(x -> x.id().equals(t.stationId())).findFirst().orElseThrow();
            assertThat(nearestMain(t.geometry(), s.outSys(), null)).as(t.id()).isLessThan(1e-6);
        }
        assertThat(N.taps()).anyMatch(t -> t.device() == TapDevice.BOTH);
        Main ci = main(SampleTown.CAST_IRON_MAIN);
        assertThat(ci.material()).isEqualTo("cast iron");
        assertThat(ci.installYr()).isEqualTo(1952);
        assertThat(N.taps()).anyMatch(t -> ci.geometry().distance(t.geometry()) < 1e-6);
        Main pr = main(SampleTown.PROPOSED_MAIN);
        assertThat(pr.status()).isEqualTo(MainStatus.PROPOSED);
        assertThat(pr.geometry().distance(ci.geometry())).isEqualTo(4.0, within(1e-9));
        assertThat(pr.geometry().getLength()).isGreaterThan(0.9 * ci.geometry().getLength());
    }

    @Test
    void valvesLieOnMainsOfTheirSystemExceptTheOffsetOne() {
        for (Valve v : N.valves()) {
            double d = nearestMain(v.geometry(), v.systemId(), null);
            if (v.id().equals(SampleTown.OFF_MAIN_VALVE)) assertThat(d).isEqualTo(5.0, within(1e-6));
            else assertThat(d).as(v.id()).isLessThan(1e-6);
        }
        LocalDate overdue = SampleTown.AS_OF.minusMonths(15); // 49 CFR 192.747: at most 15 months
        assertThat(N.valves().stream().filter(v -> v.checked() != null && v.checked().isBefore(overdue)).count())
            .isGreaterThanOrEqualTo(3);
        assertThat(N.valves().stream().filter(v -> v.operable() == Operability.NO).count()).isGreaterThanOrEqualTo(2);
        assertThat(N.valves().stream().filter(v -> v.operable() == Operability.UNKNOWN).count())
            .isGreaterThanOrEqualTo(2);
        assertThat(N.valves().stream().filter(v -> v.id().equals(SampleTown.DUPLICATE_VALVE_ID))).hasSize(2);
        assertThat(N.valves().stream().map(Valve::id).distinct().count()).isEqualTo(N.valves().size() - 1);
    }

    @Test
    void criticalCustomers() {
        List<Service> crit = N.services().stream().filter(s -> s.serviceClass() == ServiceClass.CRITICAL).toList();
        assertThat(crit).extracting(Service::critical)
            .containsExactlyInAnyOrder("clinic", "school", "school", "care home");
        Service care = crit.stream().filter(s -> s.critical().equals("care home")).findFirst().orElseThrow();
        assertThat(care.mainId()).isEqualTo(SampleTown.CAST_IRON_MAIN);
    }

    /**
     * Every main end meets another main of its system within the 0.5 m snap, except the
     * known open ends: source feeders, the east end of the IP-1 backbone (M-IP-016),
     * station stubs at the station, the proposed main,
     * and the near-miss main, whose end is 1.2 m short (inside the 2.5 m near-miss range).
     */
    @Test
    void mainsJoinAtIntersectionsAndTheNearMissIsShort() {
        Set<String> openEnds = Set.of("M-IP-001", "M-IP-016", "M-IP-023", SampleTown.PROPOSED_MAIN, SampleTown.NEAR_MISS_MAIN,
            "M-STUB-N1", "M-STUB-N2", "M-STUB-S1", "M-STUB-E1");
        for (Main m : N.mains()) {
            Coordinate[] cs = m.geometry().getCoordinates();
            for (Coordinate end : new Coordinate[] {cs[0], cs[cs.length - 1]}) {
                double d = nearestMain(pt(end), m.systemId(), m.id());
                if (!openEnds.contains(m.id())) assertThat(d).as(m.id() + " end " + end).isLessThanOrEqualTo(0.5);
            }
        }
        Main nm = main(SampleTown.NEAR_MISS_MAIN);
        Coordinate[] cs = nm.geometry().getCoordinates();
        assertThat(nearestMain(pt(cs[cs.length - 1]), nm.systemId(), nm.id())).isEqualTo(1.2, within(1e-6));
        Main pr = main(SampleTown.PROPOSED_MAIN);
        assertThat(nearestMain(pt(pr.geometry().getCoordinates()[0]), "LP-SOUTH", pr.id())).isGreaterThan(2.5);
    }

    @Test
    void systemsStayApartAndMainsFollowStreets() {
        for (Main a : N.mains()) {
            for (Main b : N.mains()) {
                if (!a.systemId().equals(b.systemId())) {
                    assertThat(a.geometry().distance(b.geometry())).as(a.id() + " / " + b.id()).isGreaterThan(1.0);
                }
            }
            double toStreet = N.context().get(0).items().stream()
                .mapToDouble(i -> i.geometry().distance(a.geometry().getCentroid())).min().orElseThrow();
            assertThat(toStreet).as(a.id()).isLessThanOrEqualTo(4.0);
        }
        assertThat(N.context().get(0).items()).allMatch(i -> i.text("name") != null && !i.text("name").isBlank());
    }

    @Test
    void theOtherFlaws() {
        Service far = N.services().stream().filter(s -> s.id().equals(SampleTown.FAR_SERVICE)).findFirst().orElseThrow();
        assertThat(far.mainId()).isNull();
        assertThat(nearestMain(far.geometry(), null, null)).isEqualTo(90.0, within(1e-6));
        // the crossing main crosses a main mid-block without a shared vertex
        Main x = main(SampleTown.CROSSING_MAIN);
        List<Main> crossed = N.mains().stream().filter(m -> !m.id().equals(x.id()))
            .filter(m -> m.geometry().crosses(x.geometry())).toList();
        assertThat(crossed).hasSize(1);
        Coordinate at = crossed.get(0).geometry().intersection(x.geometry()).getCoordinate();
        assertThat(List.of(crossed.get(0).geometry().getCoordinates())).noneMatch(c -> c.distance(at) < 0.5);
        // the misspelt status word is written as is
        WriteLayer mains = TOWN.layers().get(0);
        int row = N.mains().indexOf(main(SampleTown.MISSPELT_MAIN));
        assertThat(mains.value(row, mains.columnIndex("status"))).isEqualTo("actve");
        assertThat(mains.value(row + 1, mains.columnIndex("status"))).isEqualTo("active");
    }
}
