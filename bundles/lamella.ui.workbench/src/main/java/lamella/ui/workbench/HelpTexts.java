package lamella.ui.workbench;

/** What Help says: the user's loop through the workbench, and the keys. Plain text, shown in {@link HelpWindow}. */
final class HelpTexts {

    static final String GUIDE_TITLE = "Lamella user guide";
    static final String KEYS_TITLE = "Keyboard shortcuts";

    static final String GUIDE = String.join("\n",
            "The loop of a measurement, from sample to report. Every edit can be undone (Ctrl+Z); the status line at"
                    + " the bottom says whether the case is valid and, if not, what is wrong and where.",
            "",
            "1. Stack — describe the sample from the heated surface down: Add layer, then click a cell to type its"
                    + " value (85, or 85 nm, or 0.085 µm; click a column heading for another unit). Choose a library"
                    + " material where one fits; the layer's own values win over the library's. Give each value its"
                    + " role in a fit: fixed, free, or uncertain by a σ in % (a transducer's thickness ±3 %, say)."
                    + " The Materials panel searches every live library (shipped, your facility's, your own) by name"
                    + " or alias and shows each value with its range, σ and source.",
            "",
            "2. Set-up — choose the technique (tdtr, fdtr, sstr, 3omega, 3omega-voltage) and the heating"
                    + " geometry, and type their settings in the units beside them: modulation 9.8 MHz, repetition"
                    + " 76 MHz, radii in µm."
                    + " Frequency and delay lists take ranges: 1 kHz to 10 MHz, 30 log. Switching to another"
                    + " technique and back keeps each one's values. Enter the absorbed power to see the predicted"
                    + " steady temperature rise; tick self-heating to take the library values at the heated"
                    + " temperature (the power is then kept in the case).",
            "",
            "3. Import — drop instrument files on the window, or File ▸ Import data…; a preview shows the columns"
                    + " read and the settings the file states (modulation, repetition, radii, powers), which the new"
                    + " dataset keeps as its own; Add dataset makes it a dataset of the fit, and saving copies its"
                    + " data beside the case. The Signal panel draws the data and the model together and redraws as"
                    + " values change.",
            "",
            "4. Datasets — every dataset of the fit, numbered from 0 as the case file numbers them, with its file,"
                    + " technique, signal and points. For the chosen one: its own technique and geometry settings"
                    + " (or the case's), the fitted x range (fit from, fit to), ranges left out (0 ps to 80 ps) and"
                    + " where σ comes from; its data are drawn with σ bars, the points left out in grey.",
            "",
            "5. Sensitivity — before fitting (or before measuring), see how strongly the signal depends on each"
                    + " input over the x range: an input whose sensitivity is small cannot be fitted, and an"
                    + " uncertain input with a large one will dominate the error budget.",
            "",
            "6. Fit — Start fit fits the free inputs to every dataset at once; the values come with their 1σ"
                    + " (noise and every uncertain input), the correlations, the residuals, and the uncertainty"
                    + " budget with each source's share. Structure in the residuals means the model misses"
                    + " something. The Signal panel draws each dataset's best fit over its data; Use fitted values"
                    + " takes the fitted values into the stack (Ctrl+Z takes them back). After an edit the results"
                    + " are marked out of date; saving keeps the last fit with the project.",
            "",
            "7. Plan — before the next measurement: tick the free inputs whose σ matters and give the design"
                    + " variables (modulation, spot size, a layer's thickness, a delay's end) a range; Plan ranks the"
                    + " plans by the σ they predict, and Use this plan writes the chosen one into the case. The Map"
                    + " panel fits a case's map block position by position and shows each input as an image.",
            "",
            "8. Report — Write report… puts an HTML page with plots, tables, the budget and every input into a"
                    + " folder to keep with the sample's record.",
            "",
            "Save (Ctrl+S) keeps the project; Save as… copies its data files beside the case file, so the folder"
                    + " travels whole. The demo's own folder is never written to. Anything long (curves,"
                    + " sensitivities, fits) runs in the background: the next edit replaces it, and Stop in the"
                    + " status line cancels it.",
            "",
            "Lasers of Class 3B and 4, and driven heaters: follow your facility's safety rules (Help ▸ Laser and"
                    + " heater safety).");

    static final String KEYS = String.join("\n",
            "Ctrl+Z\tundo the last edit (Edit ▸ Undo names it)",
            "Ctrl+Shift+Z, Ctrl+Y\tredo",
            "Ctrl+N\tnew project from a case file",
            "Ctrl+O\topen a project",
            "Ctrl+S\tsave",
            "Ctrl+Shift+S\tsave as (data files copied beside the case)",
            "Ctrl+I\timport instrument data",
            "Ctrl+M\tenlarge the front area, or show all areas again",
            "Ctrl+Q\tquit (asks about unsaved changes)",
            "Enter\ttake a list or a cell's value; Escape leaves a cell unchanged",
            "",
            "In a plot: the wheel or a dragged rectangle zooms, a right- or Shift-drag pans, a double-click shows"
                    + " everything again, a right-click exports PNG or SVG.",
            "Tabs: drag a tab onto another area to join it, or against an area's edge to split it; double-click a"
                    + " tab to enlarge its area.");

    private HelpTexts() {
    }
}
