package org.kneepoint.server.app.design;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.Supplier;
import org.kneepoint.db.GradeStamp;
import org.kneepoint.db.LibraryReader;
import org.kneepoint.fitter.error.KneepointException;
import org.kneepoint.fitter.library.GradeSummary;
import org.kneepoint.fitter.loadline.TemperatureModel;
import org.kneepoint.fitter.select.Requirements;

/**
 * What a server computes from each grade's stored data — the temperature model a check works on and a selection
 * ranks ({@link GradeModel#stored}, {@link LibrarySelection#model}) — computed once
 * and kept while the grade's data are unchanged. The cache knows nothing of the values: each is kept with the grade's
 * {@link GradeStamp} (row id, edit version, number and last id of its curves), read from the library once per request;
 * a kept value whose stamp differs is computed again. So any write that changes a grade — an import that adds its
 * curves, an edit, a restore — is seen at the next request, also when another process wrote it to a shared
 * (PostgreSQL) library. A grade without a model is kept as its refusal, like a value. One entry per grade,
 * replaced when the grade changes (grades are never deleted, so the size is bounded by the library's). The results
 * of requests — a check's run, a grade's row in a selection — are kept the same way, per grade, for the last
 * {@value #KEPT_REQUESTS} distinct requests: a repeated request costs the stamp query and the answer's writing. A
 * selection's listing of the grades is kept while every grade's stamp is as it was read under. Kept models remember the
 * losses they compute ({@link GradeModel#rememberingLosses}), so a check at a new temperature repeats little work.
 */
public final class GradeModelCache {

    /** How many distinct requests (a check's inputs, a selection's requirements) keep their results. */
    static final int KEPT_REQUESTS = 64;

    /** How many listings of the grades (the whole library, or one family) are kept. */
    static final int KEPT_LISTINGS = 8;

    /** The stamp of a typed-in grade: no stored data, so its results never change. */
    private static final GradeStamp TYPED = new GradeStamp(0, 0, 0, 0);

    private final Map<Key, Entry> entries = new ConcurrentHashMap<>();

    /** Per request (least recently used first), per grade: the kept results. */
    private final Map<Object, Map<String, Entry>> results = new LinkedHashMap<>(16, 0.75f, true) {
        private static final long serialVersionUID = 1L;

        @Override
        protected boolean removeEldestEntry(Map.Entry<Object, Map<String, Entry>> eldest) {
            return size() > KEPT_REQUESTS;
        }
    };

    /** The kept listings of the grades, by family (the whole library under ""), for the last few families asked. */
    private final Map<String, Listing> listings = new LinkedHashMap<>(16, 0.75f, true) {
        private static final long serialVersionUID = 1L;

        @Override
        protected boolean removeEldestEntry(Map.Entry<String, Listing> eldest) {
            return size() > KEPT_LISTINGS;
        }
    };

    /** The temperature model of a stored grade (as {@link GradeModel#stored}); an unknown grade is not found, as there. */
    public GradeModel stored(LibraryReader reader, String grade) {
        Optional<GradeStamp> stamp = reader.gradeStamp(grade);
        if (stamp.isEmpty()) {
            return GradeModel.stored(reader, grade);
        }
        return kept(new Key(grade), stamp.get(), () -> GradeModel.stored(reader, grade).rememberingLosses(), GradeModel.class);
    }

    /**
     * A check's run on a stored or typed-in grade, with a tolerance study when {@code tolerance} is not null; the same
     * request without a study on the same stored data answers from the kept run (the last {@value #KEPT_REQUESTS}
     * distinct requests are kept). A study is always run again (its samples may be drawn anew).
     */
    public CheckRun check(LibraryReader reader, CheckRequest request, ToleranceRequest tolerance) {
        String name = request.grade().name();
        if (tolerance != null) {
            return DesignChecks.check(request, tolerance, grade -> stored(reader, grade));
        }
        if (name == null) {
            return result(request, "", TYPED, () -> DesignChecks.check(request, grade -> stored(reader, grade)));
        }
        Optional<GradeStamp> stamp = reader.gradeStamp(name);
        if (stamp.isEmpty()) {
            return DesignChecks.check(request, grade -> GradeModel.stored(reader, grade));
        }
        return result(request, name, stamp.get(), () -> DesignChecks.check(request,
                grade -> kept(new Key(grade), stamp.get(), () -> GradeModel.stored(reader, grade).rememberingLosses(), GradeModel.class)));
    }

    /**
     * The models and rows of a selection over {@code reader}, the grades' stamps read now, in one query; the same kept
     * models as {@link #stored}, since a selection builds each grade's model as a check does, and each grade's row kept
     * for the last {@value #KEPT_REQUESTS} distinct requirements.
     */
    public LibrarySelection.Models selection(LibraryReader reader) {
        Map<String, GradeStamp> stamps = reader.gradeStamps();
        return new LibrarySelection.Models() {
            @Override
            public TemperatureModel of(GradeSummary grade) {
                GradeStamp stamp = stamps.get(grade.name());
                if (stamp == null) {
                    return LibrarySelection.model(reader, grade).model();
                }
                return kept(new Key(grade.name()), stamp, () -> LibrarySelection.model(reader, grade).rememberingLosses(), GradeModel.class).model();
            }

            @Override
            public List<GradeSummary> grades(LibraryReader library, String family) {
                return listing(library, family, stamps);
            }

            @Override
            public SelectionRow row(GradeSummary grade, Requirements requirements, Supplier<SelectionRow> assess) {
                GradeStamp stamp = stamps.get(grade.name());
                return stamp == null ? assess.get() : result(requirements, grade.name(), stamp, assess);
            }
        };
    }

    /**
     * The grades of {@code family} (all when null) as the reader lists them, kept while every grade's stamp is as in
     * {@code stamps}: the listing is made of the grades' own rows and their curves' temperatures, and any write that
     * changes those (an edit, added curves, a new grade) changes a stamp. The stamps were read before the listing, so a
     * listing is never older than the stamps it is kept with.
     */
    private List<GradeSummary> listing(LibraryReader reader, String family, Map<String, GradeStamp> stamps) {
        String key = family == null ? "" : "family " + family;
        Listing kept;
        synchronized (listings) {
            kept = listings.get(key);
        }
        if (kept != null && kept.stamps().equals(stamps)) {
            return kept.grades();
        }
        List<GradeSummary> grades = reader.grades(family);
        synchronized (listings) {
            listings.put(key, new Listing(Map.copyOf(stamps), grades));
        }
        return grades;
    }

    /** The result of {@code request} on {@code grade}, kept while the grade's stamp holds, for the last distinct requests. */
    private <V> V result(Object request, String grade, GradeStamp stamp, Supplier<V> compute) {
        Map<String, Entry> perGrade;
        synchronized (results) {
            perGrade = results.computeIfAbsent(request, any -> new ConcurrentHashMap<>());
        }
        Entry entry = perGrade.get(grade);
        if (entry == null || !entry.stamp().equals(stamp)) {
            try {
                entry = new Entry(stamp, compute.get(), null);
            } catch (KneepointException e) {
                entry = new Entry(stamp, null, e);
            }
            perGrade.put(grade, entry);
        }
        if (entry.failure() != null) {
            throw entry.failure();
        }
        @SuppressWarnings("unchecked")
        V value = (V) entry.value();
        return value;
    }

    private <V> V kept(Key key, GradeStamp stamp, Supplier<V> compute, Class<V> type) {
        Entry entry = entries.get(key);
        if (entry == null || !entry.stamp().equals(stamp)) {
            try {
                entry = new Entry(stamp, compute.get(), null);
            } catch (KneepointException e) {
                entry = new Entry(stamp, null, e);
            }
            entries.put(key, entry);
        }
        if (entry.failure() != null) {
            throw entry.failure();
        }
        return type.cast(entry.value());
    }

    /** A kept listing of the grades and the stamps of every grade when it was read. */
    private record Listing(Map<String, GradeStamp> stamps, List<GradeSummary> grades) {
    }

    /** The kept model of one grade. */
    private record Key(String grade) {
    }

    /** A kept value, or the refusal its computation ended with, and the stamp of the data it came from. */
    private record Entry(GradeStamp stamp, Object value, KneepointException failure) {
    }
}
