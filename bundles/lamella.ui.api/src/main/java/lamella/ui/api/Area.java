package lamella.ui.api;

/** Where a panel opens when no saved arrangement places it. */
public enum Area { LEFT, CENTER, RIGHT, BOTTOM }
