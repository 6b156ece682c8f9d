/** The data commands ({@code import}, {@code formats}); private to their bundle (they offer Command services). */
package lamella.cli.data;
