/* The "try it" panel of each operation on the /docs page: inputs prefilled with the examples,
   a Send button using fetch (same origin), and the answer's status, headers and body.
   Inlined into page.html (after schema.js, before page.js) by src/api/docs/mod.rs. */
const EzTry = (function () {
  'use strict';
  const { el, show } = EzDom;
  const SHOWN_HEADERS = ['content-type', 'x-request-id', 'etag', 'cache-control', 'allow'];
  const BODY_DISPLAY_LIMIT = 200000;

  const shellQuote = (text) => "'" + String(text).replace(/'/g, "'\\''") + "'";

  /* The request the panel's inputs describe: {url, init, command}. */
  function buildRequest(entry, inputs, bodyField, acceptField, mediaType) {
    let path = entry.path;
    const query = new URLSearchParams();
    const headers = {};
    for (const { parameter, input } of inputs) {
      const value = input.value;
      if (parameter.in === 'path') {
        path = path.split('{' + parameter.name + '}').join(encodeURIComponent(value));
      } else if (value === '') {
        continue;
      } else if (parameter.in === 'query') {
        query.append(parameter.name, value);
      } else if (parameter.in === 'header') {
        headers[parameter.name] = value;
      }
    }
    const search = query.toString();
    const url = path + (search ? '?' + search : '');
    headers.Accept = acceptField ? acceptField.value : 'application/json, application/problem+json;q=0.9, */*;q=0.5';
    const init = { method: entry.method.toUpperCase(), headers };
    let commandBody = '';
    if (bodyField) {
      headers['Content-Type'] = mediaType;
      init.body = bodyField.value;
      let compact = bodyField.value;
      if (/json/.test(mediaType)) {
        try {
          compact = JSON.stringify(JSON.parse(bodyField.value));
        } catch (error) {
          compact = bodyField.value;
        }
      }
      commandBody = ' \\\n  -H ' + shellQuote('Content-Type: ' + mediaType) + ' \\\n  --data-binary ' + shellQuote(compact);
    }
    const accept = acceptField ? ' \\\n  -H ' + shellQuote('Accept: ' + acceptField.value) : '';
    const command = 'curl -sS -i -X ' + init.method + ' ' + shellQuote(location.origin + url) + accept + commandBody;
    return { url, init, command };
  }

  function prettyBody(text, contentType) {
    if (/json/.test(contentType)) {
      try {
        return JSON.stringify(JSON.parse(text), null, 2);
      } catch (error) {
        return text;
      }
    }
    return text;
  }

  function showAnswer(result, response, text, elapsedMs) {
    result.textContent = '';
    const statusClass = 's-' + String(response.status).charAt(0);
    result.appendChild(el('p', { class: 'result-line' }, [
      el('span', { class: 'status ' + statusClass }, String(response.status)),
      ' ' + (response.statusText || '') + ' · ' + Math.round(elapsedMs) + ' ms',
    ]));
    const list = el('dl');
    for (const name of SHOWN_HEADERS) {
      const value = response.headers.get(name);
      if (value !== null) list.append(el('dt', null, name), el('dd', null, value));
    }
    result.appendChild(list);
    const contentType = response.headers.get('content-type') || '';
    let shown = prettyBody(text, contentType);
    if (shown.length > BODY_DISPLAY_LIMIT) {
      shown = shown.slice(0, BODY_DISPLAY_LIMIT) + '\n… (' + text.length + ' characters in all; shortened here)';
    }
    result.appendChild(el('pre', { tabindex: '0', 'aria-label': 'Answer body' }, el('code', null, shown || '(empty body)')));
    if (/problem\+json/.test(contentType)) {
      try {
        const problem = JSON.parse(text);
        if (problem && typeof problem.code === 'string' && document.getElementById('problem-' + problem.code)) {
          result.appendChild(el('p', { class: 'small' }, ['What ', el('code', null, problem.code), ' means: ',
            el('a', { href: '#problem-' + problem.code }, 'Problem codes › ' + problem.code)]));
        }
      } catch (error) {
        /* not JSON after all: the raw body is shown above */
      }
    }
  }

  function okMediaTypes(operation) {
    const responses = operation.responses || {};
    const success = Object.keys(responses).find((status) => status.charAt(0) === '2');
    if (!success) return [];
    const response = EzSchema.deref(responses[success]);
    return Object.keys(response.content || {});
  }

  /* The panel for one operation. */
  function panel(entry, parameters, body, exampleText, parameterExample) {
    const id = entry.anchor + '-try';
    const inputs = [];
    const grid = el('div', { class: 'try-grid' });
    for (const parameter of parameters) {
      if (!['query', 'path', 'header'].includes(parameter.in)) continue;
      const inputId = id + '-' + parameter.in + '-' + parameter.name.replace(/[^A-Za-z0-9_-]/g, '_');
      const example = parameterExample(parameter);
      const input = el('input', {
        type: 'text', id: inputId, name: parameter.name, autocomplete: 'off', spellcheck: 'false',
        value: example === undefined ? '' : Array.isArray(example) ? example.join(',') : show(example),
        'aria-required': parameter.required ? 'true' : null,
      });
      inputs.push({ parameter, input });
      grid.append(
        el('label', { for: inputId }, [parameter.name, parameter.required ? ' *' : '', ' ', el('span', { class: 'muted' }, '(' + parameter.in + ')')]),
        input,
      );
    }
    const form = el('form', { class: 'try-body', novalidate: true });
    if (inputs.length) {
      form.appendChild(el('p', { class: 'hint' }, 'Fields marked * are required; empty optional fields are left out of the request.'));
      form.appendChild(grid);
    }
    let bodyField = null;
    if (body) {
      const bodyId = id + '-body';
      form.appendChild(el('label', { class: 'body-label', for: bodyId }, 'Body (' + body.mediaType + ')'));
      const initial = exampleText(body.example, body.mediaType);
      bodyField = el('textarea', { id: bodyId, spellcheck: 'false', rows: String(Math.min(18, Math.max(6, initial.split('\n').length + 1))), 'aria-describedby': bodyId + '-hint' });
      bodyField.value = initial;
      bodyField.dataset.initial = initial;
      form.appendChild(bodyField);
      form.appendChild(el('p', { class: 'hint', id: bodyId + '-hint' }, 'Prefilled with the example. Ctrl+Enter (or ⌘+Enter) sends.'));
      bodyField.addEventListener('keydown', (event) => {
        if (event.key === 'Enter' && (event.ctrlKey || event.metaKey)) {
          event.preventDefault();
          form.requestSubmit();
        }
      });
    }
    let acceptField = null;
    const types = okMediaTypes(entry.operation);
    if (types.length > 1) {
      const acceptId = id + '-accept';
      acceptField = el('select', { id: acceptId }, types.map((type) => el('option', { value: type }, type)));
      form.appendChild(el('div', { class: 'try-grid' }, [el('label', { for: acceptId }, 'Accept'), acceptField]));
    }
    const send = el('button', { type: 'submit' }, 'Send');
    const reset = el('button', { type: 'button', class: 'secondary' }, 'Back to the example');
    form.appendChild(el('div', { class: 'try-actions' }, [send, reset]));
    const command = el('code');
    form.appendChild(el('p', { class: 'hint' }, 'The same request from a shell:'));
    form.appendChild(el('pre', { class: 'command' }, command));
    const result = el('div', { class: 'result', 'aria-live': 'polite' });
    form.appendChild(result);

    const refreshCommand = () => {
      command.textContent = buildRequest(entry, inputs, bodyField, acceptField, body ? body.mediaType : '').command;
    };
    form.addEventListener('input', refreshCommand);
    form.addEventListener('change', refreshCommand);
    reset.addEventListener('click', () => {
      for (const { parameter, input } of inputs) {
        const example = parameterExample(parameter);
        input.value = example === undefined ? '' : Array.isArray(example) ? example.join(',') : show(example);
      }
      if (bodyField) bodyField.value = bodyField.dataset.initial || '';
      result.textContent = '';
      refreshCommand();
    });
    form.addEventListener('submit', async (event) => {
      event.preventDefault();
      refreshCommand();
      const request = buildRequest(entry, inputs, bodyField, acceptField, body ? body.mediaType : '');
      send.disabled = true;
      send.textContent = 'Sending…';
      const started = performance.now();
      try {
        const response = await fetch(request.url, request.init);
        const text = await response.text();
        showAnswer(result, response, text, performance.now() - started);
      } catch (error) {
        result.textContent = '';
        result.appendChild(el('p', { class: 'load-status error', role: 'alert' }, 'No answer: ' + error.message));
      } finally {
        send.disabled = false;
        send.textContent = 'Send';
      }
    });
    refreshCommand();
    return el('details', { class: 'try', id }, [el('summary', null, 'Try it'), form]);
  }

  return { panel };
})();
