// Progressive enhancement only: every page works without this file.
// When a form comes back with problems, move the keyboard focus to the list of problems, so that a screen reader
// announces it and a keyboard user starts from it.
document.addEventListener("DOMContentLoaded", function () {
    var summary = document.querySelector(".error-summary");
    if (summary) {
        if (!summary.hasAttribute("tabindex")) {
            summary.setAttribute("tabindex", "-1");
        }
        summary.focus();
    }
});
