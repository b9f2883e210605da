package org.lodestep.cli;

import org.lodestep.qa.RecordStore;
import org.lodestep.qa.RecordStores;
import org.lodestep.qa.StoreException;

import picocli.CommandLine.Option;

/** The {@code --db} option every {@code qa} command shares. */
final class QaStoreOption {

    @Option(names = "--db", paramLabel = "FILE|URL",
            description = {"Record store: a SQLite file (default ./" + RecordStores.DEFAULT_FILE + ", created on first "
                    + "use) or jdbc:postgresql://HOST:PORT/DB[?currentSchema=S] shared by several stations.",
                    "PostgreSQL credentials come from LODESTEP_DB_USER / LODESTEP_DB_PASSWORD (or PGUSER / PGPASSWORD, "
                            + "or ~/.pgpass), never from the command line."})
    String db;

    /** Opens a store that must already hold records: reading commands never create an empty file by mistake. */
    RecordStore openExisting() throws StoreException {
        RecordStores.sqliteFile(db).filter(f -> !java.nio.file.Files.exists(f)).ifPresent(f -> {
            throw new UsageException("no QA records at " + f + ": run `lodestep qa check` first, or give --db");
        });
        return open();
    }

    /**
     * {@code p} with the record store as an input: a SQLite file is hashed as it is now (the state the report read);
     * a PostgreSQL store is named by the command line, and each record carries its own SHA-256.
     */
    org.lodestep.workflow.Provenance provenance(org.lodestep.workflow.Provenance p) {
        return RecordStores.sqliteFile(db).filter(java.nio.file.Files::exists)
                .map(f -> p.withInput("record store", f)).orElse(p);
    }

    RecordStore open() throws StoreException {
        try {
            return RecordStores.open(db, System.getenv());
        } catch (IllegalArgumentException e) {
            throw new UsageException("--db: " + e.getMessage());
        }
    }
}
