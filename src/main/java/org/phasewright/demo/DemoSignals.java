package org.phasewright.demo;

import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;

/**
 * Generates the demo signals in {@code demo-signals/}: five invented measurement scenarios, each
 * rendered from a fixed seed so that a re-run reproduces the committed files byte for byte.
 *
 * <p>Run {@code java -cp target/classes org.phasewright.demo.DemoSignals demo-signals} from the
 * repository root (or with the application jar on the class path). Each file is written to a
 * temporary file beside it and then renamed, so a file is either the old or the new version.
 * Cost: a few hundred milliseconds; the files total well under 1 MB.
 */
public final class DemoSignals {

    private DemoSignals() {
    }

    /** The scenarios, in the order the demo README lists them. */
    public static List<DemoScenario> scenarios() {
        return List.of(new PumpAccelerometer(), new WorkshopHum(), new HarbourLevel(),
                new GreenhouseTemperature(), new MotorDriveCurrent());
    }

    /** Renders every scenario. */
    public static List<DemoFile> render() {
        List<DemoFile> files = new ArrayList<>();
        for (DemoScenario s : scenarios()) {
            files.add(new DemoFile(s.fileName(), s.render()));
        }
        return files;
    }

    /** Writes every demo file into {@code dir} (created if missing), atomically per file. */
    public static List<Path> writeAll(Path dir) throws IOException {
        Files.createDirectories(dir);
        List<Path> written = new ArrayList<>();
        for (DemoFile f : render()) {
            Path target = dir.resolve(f.name());
            Path tmp = dir.resolve("." + f.name() + ".tmp");
            try {
                Files.write(tmp, f.content());
                try {
                    Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
                } catch (AtomicMoveNotSupportedException e) {
                    Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
                }
            } finally {
                Files.deleteIfExists(tmp);
            }
            written.add(target);
        }
        return written;
    }

    /** Entry point: {@code DemoSignals [DIR]}, DIR defaulting to {@code demo-signals}. */
    public static void main(String[] args) throws IOException {
        if (args.length > 1) {
            System.err.println("usage: java -cp <classes> org.phasewright.demo.DemoSignals [DIR]");
            System.exit(2);
        }
        Path dir = Path.of(args.length == 1 ? args[0] : "demo-signals");
        for (Path p : writeAll(dir)) {
            System.out.println("wrote " + p + " (" + Files.size(p) + " bytes)");
        }
    }
}
