package org.kneepoint.db;

import static org.kneepoint.db.jooq.Tables.CURVE;
import static org.kneepoint.db.jooq.Tables.CURVE_PIECE;
import static org.kneepoint.db.jooq.Tables.FIT;
import static org.kneepoint.db.jooq.Tables.GRADE;
import static org.kneepoint.db.jooq.Tables.IMPORT_RECORD;
import static org.kneepoint.db.jooq.Tables.LOT;
import static org.kneepoint.db.jooq.Tables.LOT_CURVE;
import static org.kneepoint.db.jooq.Tables.LOT_CURVE_PIECE;
import static org.kneepoint.db.jooq.Tables.MATERIAL_FAMILY;
import static org.kneepoint.db.jooq.Tables.SPECIFICATION;
import static org.kneepoint.db.jooq.Tables.SPECIFICATION_LIMIT;
import static org.kneepoint.db.jooq.Tables.SUSCEPTIBILITY_POINT;
import static org.kneepoint.db.jooq.Tables.TABLE_ROW_COUNT;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;
import org.jooq.DSLContext;
import org.jooq.Record;
import org.jooq.Table;
import org.kneepoint.db.jooq.tables.records.TableRowCountRecord;

/**
 * How many rows each table of the library holds, kept in {@code table_row_count} with a checksum
 * per count. A checksum finds a changed row; only a count finds a row, or a whole table, that
 * vanished from a damaged file. Sealed at the end of every write transaction, which first locks
 * the count rows (on both engines, in one order), so that two writers, in one process or several,
 * never count past each other.
 */
final class RowCounts {

    static final List<Table<? extends Record>> TABLES = List.of(IMPORT_RECORD, MATERIAL_FAMILY, GRADE, CURVE, CURVE_PIECE,
            SUSCEPTIBILITY_POINT, FIT, SPECIFICATION, SPECIFICATION_LIMIT, LOT, LOT_CURVE, LOT_CURVE_PIECE);

    private RowCounts() {
    }

    /** Waits for, then holds until the transaction ends, the right to write: the count rows, locked. */
    static void takeWriteLock(DSLContext tx) {
        tx.selectFrom(TABLE_ROW_COUNT).orderBy(TABLE_ROW_COUNT.TABLE_NAME).forUpdate().fetch();
    }

    /** Records how many rows each table holds now, each count with its checksum. */
    static void seal(DSLContext tx) {
        Map<String, TableRowCountRecord> stored = new HashMap<>();
        tx.selectFrom(TABLE_ROW_COUNT).forEach(row -> stored.put(row.getTableName(), row));
        for (Table<? extends Record> table : TABLES) {
            long count = tx.fetchCount(table);
            TableRowCountRecord row = stored.get(table.getName());
            if (row != null && row.getRowCount() == count && sound(row)) {
                continue;
            }
            tx.deleteFrom(TABLE_ROW_COUNT).where(TABLE_ROW_COUNT.TABLE_NAME.eq(table.getName())).execute();
            TableRowCountRecord fresh = tx.newRecord(TABLE_ROW_COUNT);
            fresh.setTableName(table.getName());
            fresh.setRowCount(count);
            fresh.setChecksum(RowChecksums.whole(TABLE_ROW_COUNT.getName(), fresh));
            fresh.store();
        }
    }

    /** Tells the sink of every table whose row count differs from the sealed one, or whose count is missing or damaged. */
    static void check(DSLContext dsl, Consumer<String> damaged) {
        Map<String, TableRowCountRecord> stored = new HashMap<>();
        for (TableRowCountRecord row : dsl.selectFrom(TABLE_ROW_COUNT)) {
            if (!sound(row)) {
                damaged.accept("the stored row count of " + describe(row.getTableName()) + " does not match its checksum");
            }
            stored.put(row.getTableName(), row);
        }
        for (Table<? extends Record> table : TABLES) {
            TableRowCountRecord row = stored.get(table.getName());
            if (row == null) {
                damaged.accept("the row count of " + describe(table.getName()) + " is not stored");
                continue;
            }
            long count = dsl.fetchCount(table);
            if (count != row.getRowCount()) {
                damaged.accept(describe(table.getName()) + " holds " + count + " rows where " + row.getRowCount() + " were written");
            }
        }
    }

    /** Throws at the first table whose count is wrong. */
    static void check(DSLContext dsl) {
        check(dsl, what -> {
            throw new DamagedDataException(DamagedDataException.message(what));
        });
    }

    private static boolean sound(TableRowCountRecord row) {
        return RowChecksums.whole(TABLE_ROW_COUNT.getName(), row).equals(row.getChecksum());
    }

    private static String describe(String table) {
        return "the table " + table.replace('_', ' ');
    }
}
