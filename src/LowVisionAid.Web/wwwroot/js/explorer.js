// Magnifier explorer: refresh the figures as the inputs change. The server computes them (?handler=Figures);
// this file only sends the inputs and shows the answer. Without script the form is submitted instead.
(function () {
  'use strict';
  var form = document.getElementById('explorer-form');
  if (!form || !window.fetch) { return; }
  var result = document.getElementById('explorer-result');
  var pending = 0;

  function show(figures) {
    var list = document.createElement('dl');
    [['Working distance (lens to page)', figures.workingDistance, 'explorer-distance'],
     ['Field on the page', figures.field, 'explorer-field'],
     ['Letters in view', figures.letters, 'explorer-letters']].forEach(function (row) {
      var dt = document.createElement('dt');
      dt.textContent = row[0];
      var dd = document.createElement('dd');
      dd.id = row[2];
      dd.textContent = row[1];
      list.appendChild(dt);
      list.appendChild(dd);
    });
    result.replaceChildren(list);
  }

  function problem(text) {
    var p = document.createElement('p');
    p.setAttribute('role', 'alert');
    p.id = 'explorer-error';
    p.textContent = text;
    result.replaceChildren(p);
  }

  function refresh() {
    var ticket = ++pending;
    var query = new URLSearchParams(new FormData(form)).toString();
    fetch(form.getAttribute('data-figures') + '&' + query, { headers: { Accept: 'application/json' } })
      .then(function (response) { return response.json().then(function (body) { return { ok: response.ok, body: body }; }); })
      .then(function (answer) {
        if (ticket !== pending) { return; }
        if (answer.ok) { show(answer.body); } else { problem(answer.body.error); }
      })
      .catch(function () { if (ticket === pending) { problem('The figures could not be fetched; use the button.'); } });
  }

  form.addEventListener('input', refresh);
  form.addEventListener('submit', function (event) { event.preventDefault(); refresh(); });
})();
