package org.depotcast.common;

import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.BinaryOperator;
import java.util.function.Consumer;
import java.util.function.Function;

/**
 * What one CSV import is: the columns it needs, how a row becomes the feature's request record, and the service call
 * that applies a request (the one the JSON endpoint makes, so its rules and scope checks hold for every row).
 * {@link CsvImporter} runs it. Built once per upload, so a row reader may keep state (e.g. keys seen in the file).
 *
 * @param <R> the request record a row maps to
 */
public final class CsvImport<R> {
    final List<String> requiredColumns;
    final Function<CsvRow, R> rowReader;
    final Set<String> identifierColumns = new LinkedHashSet<>();
    final Map<String, String> columnOfField = new HashMap<>();
    String scopeColumn;
    Consumer<R> apply;
    Function<R, String> groupKey;
    BinaryOperator<R> merge;
    Function<R, List<?>> linesOf;
    String linesField;
    Runnable afterAll;

    private CsvImport(List<String> requiredColumns, Function<CsvRow, R> rowReader) {
        this.requiredColumns = List.copyOf(requiredColumns);
        this.rowReader = rowReader;
        this.scopeColumn = requiredColumns.get(0);
    }

    public static <R> CsvImport<R> of(List<String> requiredColumns, Function<CsvRow, R> rowReader) {
        return new CsvImport<>(requiredColumns, rowReader);
    }

    /** Columns holding identifiers (part numbers, asset ids, codes): refused when a spreadsheet would run them. */
    public CsvImport<R> identifiers(String... columns) {
        identifierColumns.addAll(List.of(columns));
        return this;
    }

    /** A request field whose column is not its snake_case name (e.g. {@code code} read from {@code model_code}). */
    public CsvImport<R> column(String field, String column) {
        columnOfField.put(field, column);
        return this;
    }

    /** The column named when the service refuses a row as outside the caller's locations (default: the first). */
    public CsvImport<R> scopeColumn(String column) {
        scopeColumn = column;
        return this;
    }

    /** Each valid row's request is applied as soon as it is read, while the file has had no problem. */
    public CsvImport<R> applyEach(Consumer<R> apply) {
        this.apply = apply;
        return this;
    }

    /**
     * Rows sharing a key make one request (a model and its bill of materials, an order and its lines): each row reads
     * as a request with its own one line, {@code merge} joins them, and every whole request is applied after the
     * last row. {@code linesField} is the request's list of lines, so a refusal of line i names the row it came from.
     */
    public CsvImport<R> applyGrouped(Function<R, String> key, BinaryOperator<R> merge, String linesField,
                                     Function<R, List<?>> linesOf, Consumer<R> apply) {
        this.groupKey = key;
        this.merge = merge;
        this.linesField = linesField;
        this.linesOf = linesOf;
        this.apply = apply;
        return this;
    }

    /** Runs after every row was applied, inside the same transaction (e.g. pumps take the status their repairs imply). */
    public CsvImport<R> afterAll(Runnable afterAll) {
        this.afterAll = afterAll;
        return this;
    }

    String columnOf(String field) {
        String mapped = columnOfField.get(field);
        if (mapped != null) {
            return mapped;
        }
        StringBuilder snake = new StringBuilder();
        for (char c : field.toCharArray()) {
            if (Character.isUpperCase(c)) {
                snake.append('_').append(Character.toLowerCase(c));
            } else {
                snake.append(c);
            }
        }
        return snake.toString();
    }
}
