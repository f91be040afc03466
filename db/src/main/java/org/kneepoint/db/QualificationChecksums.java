package org.kneepoint.db;

import static org.kneepoint.db.jooq.Tables.LOT;
import static org.kneepoint.db.jooq.Tables.LOT_CURVE;
import static org.kneepoint.db.jooq.Tables.LOT_CURVE_PIECE;
import static org.kneepoint.db.jooq.Tables.SPECIFICATION;
import static org.kneepoint.db.jooq.Tables.SPECIFICATION_LIMIT;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;
import org.jooq.DSLContext;
import org.jooq.Field;
import org.jooq.Table;
import org.jooq.UpdatableRecord;
import org.jooq.impl.DSL;

/**
 * Row checksums of the specifications and lots (migration V6), over each row whole ({@link RowChecksums#whole}):
 * sealed at the end of every transaction that writes them, checked before every read of them and by
 * {@code verify} (a row that vanishes whole is found by {@link RowCounts}). The tables are small beside the curves, so
 * each seal and each check takes them whole.
 */
final class QualificationChecksums {

    private static final List<Table<? extends UpdatableRecord<?>>> TABLES = List.of(SPECIFICATION, SPECIFICATION_LIMIT, LOT, LOT_CURVE,
            LOT_CURVE_PIECE);

    private QualificationChecksums() {
    }

    /** Gives every row whose checksum is missing or stale (written in this transaction) its checksum. */
    static void seal(DSLContext tx) {
        for (Table<? extends UpdatableRecord<?>> table : TABLES) {
            Field<String> checksum = checksumOf(table);
            var rows = tx.selectFrom(table).fetch();
            for (UpdatableRecord<?> row : rows) {
                String expected = RowChecksums.whole(table.getName(), row);
                if (!expected.equals(row.get(checksum))) {
                    row.set(checksum, expected);
                    row.update(checksum);
                }
            }
        }
    }

    /**
     * The first damaged row, thrown as such; nothing when every row matches its checksum. The grades and import records
     * the reads join to (names, file checksums) are checked too.
     */
    static void check(DSLContext dsl) {
        CheckedRows joined = new CheckedRows(dsl, CheckedRows.refusing());
        joined.grades(DSL.noCondition());
        joined.imports(DSL.noCondition());
        scan(dsl, what -> {
            throw new DamagedDataException(DamagedDataException.message(what));
        }, null);
    }

    /** Every damaged row, described, and the rows checked per table. */
    static List<String> verify(DSLContext dsl, Map<String, Integer> checked) {
        List<String> damaged = new ArrayList<>();
        scan(dsl, damaged::add, checked);
        return damaged;
    }

    private static void scan(DSLContext dsl, Consumer<String> damaged, Map<String, Integer> checked) {
        for (Table<? extends UpdatableRecord<?>> table : TABLES) {
            Field<String> checksum = checksumOf(table);
            var rows = dsl.selectFrom(table).fetch();
            if (checked != null) {
                checked.put(table.getName(), rows.size());
            }
            for (UpdatableRecord<?> row : rows) {
                if (!RowChecksums.whole(table.getName(), row).equals(row.get(checksum))) {
                    damaged.accept(describe(table, row));
                }
            }
        }
    }

    private static String describe(Table<?> table, UpdatableRecord<?> row) {
        return "a row of " + table.getName().replace('_', ' ') + " (key " + row.key().intoList() + ") does not match its checksum";
    }

    @SuppressWarnings("unchecked")
    private static Field<String> checksumOf(Table<?> table) {
        return (Field<String>) table.field("checksum");
    }
}
