package lamella.cli;

/** One live contribution as {@code lamella plugins} shows it. */
record ServiceRow(String kind, String name, String summary, String bundle, String version) {
}
