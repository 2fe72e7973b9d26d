package org.streetcomb.read;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import org.sqlite.SQLiteConfig;

/**
 * Opens a GeoPackage (an SQLite file) for reading without leaving anything beside it. Opened read-only, SQLite
 * still makes {@code -wal} and {@code -shm} files next to a database in write-ahead-log mode; opened as
 * immutable (https://www.sqlite.org/uri.html, "immutable") it makes none. A database that already has a
 * {@code -wal} file holds changes not yet in the main file, which immutable mode would not see; it is opened
 * read-only instead, and SQLite uses the files that are already there.
 */
final class GeoPackageConnection {

    private GeoPackageConnection() {
    }

    static Connection open(Path file) throws SQLException {
        SQLiteConfig config = new SQLiteConfig();
        config.setReadOnly(true);
        Path absolute = file.toAbsolutePath();
        boolean pending = Files.exists(absolute.resolveSibling(absolute.getFileName() + "-wal"));
        String uri = absolute.toUri().toString() + (pending ? "" : "?immutable=1");
        return DriverManager.getConnection("jdbc:sqlite:" + uri, config.toProperties());
    }
}
