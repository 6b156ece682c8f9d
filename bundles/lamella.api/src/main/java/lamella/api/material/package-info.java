/**
 * Material libraries: curated property values with their source, uncertainty, temperature range and curation, and
 * the precedence (user over facility over shipped) that decides which library a material name means.
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("0.1.1")
package lamella.api.material;
