package org.lodestep.qa;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Map;
import java.util.Optional;

import org.junit.jupiter.api.Test;

class RecordStoresTest {

    @Test
    void passwordInUrlIsRefusedBeforeAnyConnection() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> RecordStores.open("jdbc:postgresql://db.example/qa?user=a&Password=b", Map.of()));
        assertTrue(e.getMessage().contains("LODESTEP_DB_PASSWORD"), e.getMessage());
    }

    @Test
    void otherDatabasesAreRefused() {
        assertThrows(IllegalArgumentException.class, () -> RecordStores.open("jdbc:mysql://h/db", Map.of()));
    }

    @Test
    void locationsMapToSqliteFilesOrNot() {
        assertEquals(Optional.of(Path.of(RecordStores.DEFAULT_FILE)), RecordStores.sqliteFile(null));
        assertEquals(Optional.of(Path.of("/x/y.db")), RecordStores.sqliteFile("jdbc:sqlite:/x/y.db"));
        assertEquals(Optional.of(Path.of("qa.sqlite")), RecordStores.sqliteFile("qa.sqlite"));
        assertFalse(RecordStores.sqliteFile("jdbc:postgresql://h/db").isPresent());
    }

    @Test
    void postgresUserComesFromTheEnvironment() throws Exception {
        try (Backend.Postgres pg = new Backend.Postgres()) {
            // The URL names no user; the environment map does, as a station's shell would.
            String url = pg.location().replace("user=postgres&", "");
            assertFalse(url.contains("user="));
            try (RecordStore store = RecordStores.open(url, Map.of("LODESTEP_DB_USER", "postgres"))) {
                assertTrue(store.location().contains("schema lodestep_qa_"), store.location());
                assertFalse(store.location().contains("user"), store.location());
                assertEquals(0, store.find(RecordQuery.all()).size());
            }
        }
    }
}
