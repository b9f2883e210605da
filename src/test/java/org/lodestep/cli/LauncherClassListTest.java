package org.lodestep.cli;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;

/**
 * The launcher adds to its class-data archive a fixed list of classes that only large inputs load. A name there that
 * no longer names a class (renamed, removed) would be skipped by the archive dump without a word, and the launch it
 * was meant to spare would open the whole jar again: every name must load.
 */
class LauncherClassListTest {

    @Test
    void everyListedClassExists() throws IOException {
        List<String> names = listedClasses(Files.readAllLines(Path.of("lodestep")));
        assertTrue(names.size() >= 5, "the launcher's list of large-input classes was not found: " + names);
        ClassLoader loader = LauncherClassListTest.class.getClassLoader();
        for (String name : names) {
            assertDoesNotThrow(() -> Class.forName(name.replace('/', '.'), false, loader),
                    "the launcher lists " + name + ", which is no class");
        }
    }

    /** The lines of the here-document written to the large-input class list. */
    private static List<String> listedClasses(List<String> script) {
        List<String> names = new ArrayList<>();
        boolean inside = false;
        for (String line : script) {
            if (line.contains(".large.classes\" <<'EOF'")) {
                inside = true;
            } else if (inside && line.equals("EOF")) {
                break;
            } else if (inside) {
                names.add(line.strip());
            }
        }
        return names;
    }
}
