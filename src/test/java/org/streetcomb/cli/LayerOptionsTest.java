package org.streetcomb.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.streetcomb.read.ReadOptions;
import org.streetcomb.read.TravelMode;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The shared layer options parse into the read configuration the readers take. */
class LayerOptionsTest {

    @Command(name = "probe")
    static final class Probe {
        @CommandLine.Mixin
        LayerOptions layer;
    }

    private static Probe parse(String... args) {
        Probe probe = new Probe();
        new CommandLine(probe).parseArgs(args);
        return probe;
    }

    @Test
    void defaultsMatchTheReaderDefaults() {
        Probe probe = parse();
        assertEquals(ReadOptions.DEFAULTS, probe.layer.readOptions());
        assertEquals(0.5, probe.layer.snap());
    }

    @Test
    void parsesEveryOption() {
        ReadOptions o = parse("--name-field=STREET", "--oneway-field=DIR", "--oneway-forward=FT,W",
                "--oneway-backward=TF", "--oneway-both=B", "--keep=CLASS=a,b", "--drop=USE=private",
                "--required-field=GRIT", "--mode=WALK", "--service-roads", "--private-roads", "--crs=EPSG:27700",
                "--level-field=LAYER", "--cost-field=MINUTES")
                .layer.readOptions();
        assertEquals("STREET", o.nameField());
        assertEquals(Set.of("ft", "w"), o.onewayForward());
        assertEquals(Set.of("tf"), o.onewayBackward());
        assertEquals(Set.of("b"), o.onewayBoth());
        assertEquals(List.of(new ReadOptions.FieldFilter("CLASS", Set.of("a", "b"))), o.keep());
        assertEquals(List.of(new ReadOptions.FieldFilter("USE", Set.of("private"))), o.drop());
        assertEquals("GRIT", o.requiredField());
        assertEquals(TravelMode.WALK, o.mode());
        assertEquals("EPSG:27700", o.crs());
        assertEquals(true, o.serviceRoads() && o.privateRoads());
        assertEquals(true, o.gradeSeparated());
        assertEquals("LAYER", o.levelField());
        assertEquals("MINUTES", o.costField());
    }

    @Test
    void refusesBadValues() {
        assertThrows(CommandLine.ParameterException.class, () -> parse("--keep=novalue"));
        assertThrows(CommandLine.ParameterException.class, () -> parse("--mode=fly"));
        CommandLine cl = new CommandLine(new Probe());
        cl.parseArgs("--snap=0");
        Probe probe = cl.getCommand();
        assertThrows(CommandLine.ParameterException.class, probe.layer::snap);
    }
}
