// Progressive enhancement only: every page works without this file.
// When a form comes back with problems, move the keyboard focus to the list of problems (the error-summary tag
// helper, Infrastructure/FormFieldTagHelper.cs), so that a screen reader announces it and a keyboard user starts
// from it. The summary also carries autofocus, which covers a browser running without this file.
// Following a link in the summary puts the focus in the field itself (a plain link to #id only scrolls to it) and
// brings the field's label into view with it.
// Printing opens every disclosure (a plan's options in full), and closing the print dialogue restores them.
window.addEventListener("beforeprint", function () {
    document.querySelectorAll("details:not([open])").forEach(function (d) {
        d.setAttribute("open", "");
        d.setAttribute("data-opened-for-print", "");
    });
});
window.addEventListener("afterprint", function () {
    document.querySelectorAll("details[data-opened-for-print]").forEach(function (d) {
        d.removeAttribute("open");
        d.removeAttribute("data-opened-for-print");
    });
});

// A link to a disclosure (an option's row in a plan's comparison table) opens it where it is, with any disclosure
// around it, and puts the keyboard focus on its summary; so does arriving at the page with its address (after a
// choice for the handout). Without this file the browser still scrolls to the closed option.
function openDisclosure(id) {
    var target = id && document.getElementById(id);
    if (!target || target.tagName !== "DETAILS") {
        return null;
    }
    for (var d = target; d; d = d.parentElement && d.parentElement.closest("details")) {
        d.open = true;
    }
    return target;
}
document.addEventListener("click", function (event) {
    var link = event.target.closest && event.target.closest("a[href^='#']");
    var target = link && openDisclosure(decodeURIComponent(link.getAttribute("href").slice(1)));
    if (target) {
        setTimeout(function () { target.querySelector("summary").focus({ preventScroll: true }); }, 0);
    }
});
document.addEventListener("DOMContentLoaded", function () {
    openDisclosure(decodeURIComponent(location.hash.slice(1)));
});

document.addEventListener("DOMContentLoaded", function () {
    var summary = document.querySelector(".error-summary");
    if (!summary) {
        return;
    }
    if (!summary.hasAttribute("tabindex")) {
        summary.setAttribute("tabindex", "-1");
    }
    if (document.activeElement !== summary) {
        summary.focus();
    }
    summary.addEventListener("click", function (event) {
        var link = event.target.closest("a[href^='#']");
        var field = link && document.getElementById(decodeURIComponent(link.getAttribute("href").slice(1)));
        if (!field) {
            return;
        }
        event.preventDefault();
        var label = document.querySelector("label[for='" + field.id + "']");
        var group = field.closest("fieldset");
        (group || label || field).scrollIntoView();
        field.focus({ preventScroll: true });
    });
});
