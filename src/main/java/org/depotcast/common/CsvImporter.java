package org.depotcast.common;

import io.quarkus.security.ForbiddenException;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Status;
import jakarta.transaction.SystemException;
import jakarta.transaction.TransactionManager;
import jakarta.transaction.Transactional;
import jakarta.validation.ConstraintViolation;
import jakarta.validation.Validator;
import org.hibernate.validator.engine.HibernateConstraintViolation;

import java.io.InputStream;
import java.io.Reader;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The one way a CSV file is imported. Rows stream from the upload; each becomes the feature's request record, is
 * checked with the same Bean Validation as the JSON endpoint and applied through the same service call, all in one
 * transaction. Any problem (a cell that is no number, a broken constraint, a row the service refuses) is listed by
 * row and column, and the whole file is refused: 400, nothing written (the transaction rolls back).
 */
@ApplicationScoped
public class CsvImporter {
    private static final Pattern INDEXED = Pattern.compile("(\\w+)\\[(\\d+)]");

    private final Validator validator;
    private final TransactionManager transactions;

    CsvImporter(Validator validator, TransactionManager transactions) {
        this.validator = validator;
        this.transactions = transactions;
    }

    /** Imports the upload; answers how many data rows it had. */
    @Transactional
    public <R> int run(InputStream body, CsvImport<R> spec) {
        try (CsvUpload upload = CsvUpload.open(body, spec.requiredColumns, spec.identifierColumns)) {
            return run(upload, spec);
        }
    }

    @Transactional
    public <R> int run(Reader body, CsvImport<R> spec) {
        try (CsvUpload upload = CsvUpload.open(body, spec.requiredColumns, spec.identifierColumns)) {
            return run(upload, spec);
        }
    }

    private <R> int run(CsvUpload upload, CsvImport<R> spec) {
        CsvProblems problems = upload.problems();
        Map<String, Group<R>> groups = new LinkedHashMap<>();
        DatedAhead datedAhead = new DatedAhead();
        int rows = 0;
        for (CsvRow row : upload) {
            rows++;
            R request = spec.rowReader.apply(row);
            boolean ahead = request != null && validate(row, request, spec, datedAhead);
            // A row with a problem is not applied; later rows still are, so the service's own refusals (an unknown
            // part, a depot outside one's scope) are listed too. All is rolled back at the end if anything was wrong.
            if (request == null || row.hasProblems() || ahead || !writable()) {
                continue;
            }
            if (spec.groupKey == null) {
                apply(spec, request, new Group<>(request, row.line(), spec), problems, datedAhead);
            } else {
                groups.merge(spec.groupKey.apply(request), new Group<>(request, row.line(), spec), (a, b) -> a.join(b, spec));
            }
        }
        if (rows == 0 && problems.isEmpty()) {
            throw new InvalidInputException("body", "CSV has a header but no rows");
        }
        for (Group<R> group : groups.values()) {
            if (!writable()) {
                break;
            }
            apply(spec, group.request, group, problems, datedAhead);
        }
        if (problems.isEmpty() && datedAhead.field == null && spec.afterAll != null) {
            spec.afterAll.run();
        }
        problems.throwIfAny();
        if (datedAhead.field != null) {
            // Well-formed but dated after it could have happened: refused as the JSON endpoint refuses it (422).
            throw new DatedInFutureException(datedAhead.field);
        }
        return rows;
    }

    /** Checks the request's constraints; true when its only fault is a date ahead of today (kept aside, see run). */
    private <R> boolean validate(CsvRow row, R request, CsvImport<R> spec, DatedAhead datedAhead) {
        boolean ahead = false;
        for (ConstraintViolation<R> v : validator.validate(request)) {
            String column = spec.columnOf(leaf(v.getPropertyPath().toString()));
            if (inTheFuture(v)) {
                datedAhead.note("row " + row.line() + ", column " + column);
                ahead = true;
            } else if (!row.rejected(column)) {
                // A cell that could not be read at all is listed once, not again as "must not be null".
                row.reject(column, v.getMessage());
            }
        }
        return ahead;
    }

    private static boolean inTheFuture(ConstraintViolation<?> v) {
        try {
            return v.unwrap(HibernateConstraintViolation.class).getDynamicPayload(DateBounds.InTheFuture.class) != null;
        } catch (jakarta.validation.ValidationException notHibernate) {
            return false;
        }
    }

    /** The first cell dated ahead of today: answered 422 once the file has no other problem. */
    private static final class DatedAhead {
        private String field;

        void note(String where) {
            if (field == null) {
                field = where;
            }
        }
    }

    /** False once a refusal inside a nested transactional call has marked the transaction for rollback. */
    private boolean writable() {
        try {
            return transactions.getStatus() == Status.STATUS_ACTIVE;
        } catch (SystemException e) {
            return false;
        }
    }

    /** Applies one request; a refusal becomes a problem of the row (and column) it came from. */
    private <R> boolean apply(CsvImport<R> spec, R request, Group<R> source, CsvProblems problems,
                              DatedAhead datedAhead) {
        try {
            spec.apply.accept(request);
            return true;
        } catch (DatedInFutureException e) {
            CsvProblems where = new CsvProblems();
            refuse(spec, source, e.field(), e.getMessage(), where);
            try {
                where.throwIfAny();
            } catch (InvalidInputException located) {
                datedAhead.note(located.errors().get(0).field());
            }
        } catch (InvalidInputException e) {
            e.errors().forEach(error -> refuse(spec, source, error.field(), error.message(), problems));
        } catch (EntityMissingException e) {
            refuse(spec, source, e.field(), e.getMessage(), problems);
        } catch (BusinessRuleException e) {
            refuse(spec, source, e.field(), e.getMessage(), problems);
        } catch (ConflictException e) {
            refuse(spec, source, e.field(), e.getMessage(), problems);
        } catch (ForbiddenException e) {
            refuse(spec, source, null, e.getMessage(), problems);
        }
        return false;
    }

    private static <R> void refuse(CsvImport<R> spec, Group<R> source, String field, String message,
                                   CsvProblems problems) {
        int line = source.lines.get(0);
        String column = spec.scopeColumn;
        if (field != null) {
            column = spec.columnOf(leaf(field));
            Matcher indexed = INDEXED.matcher(field);
            if (spec.linesField != null && indexed.find() && indexed.group(1).equals(spec.linesField)) {
                int index = Integer.parseInt(indexed.group(2));
                line = index < source.lineRows.size() ? source.lineRows.get(index) : line;
            }
        }
        problems.add(line, column, message);
    }

    /** The property a path ends in: "bom[2].quantity" → quantity; container nodes ("<list element>") are skipped. */
    private static String leaf(String path) {
        String[] parts = path.split("\\.");
        for (int i = parts.length - 1; i >= 0; i--) {
            if (!parts[i].startsWith("<")) {
                int bracket = parts[i].indexOf('[');
                return bracket < 0 ? parts[i] : parts[i].substring(0, bracket);
            }
        }
        return path;
    }

    /** Rows joined into one request, with the row each of its lines came from. */
    private static final class Group<R> {
        private R request;
        private final List<Integer> lines = new ArrayList<>();
        private final List<Integer> lineRows = new ArrayList<>();

        Group(R request, int line, CsvImport<R> spec) {
            this.request = request;
            this.lines.add(line);
            List<?> requestLines = spec.linesOf == null ? null : spec.linesOf.apply(request);
            for (int i = 0; requestLines != null && i < requestLines.size(); i++) {
                lineRows.add(line);
            }
        }

        Group<R> join(Group<R> next, CsvImport<R> spec) {
            request = spec.merge.apply(request, next.request);
            lines.addAll(next.lines);
            lineRows.addAll(next.lineRows);
            return this;
        }
    }
}
