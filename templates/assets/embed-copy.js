// aequa: the map page's "Use this map in your own page" section. Turns the links in the frame code into full
// addresses (from the address this page is read at), shows the copy buttons and copies on a press, saying
// in the status text next to the button whether it worked. Without it the code can still be selected by hand.
(function () {
  "use strict";
  function fullAddresses(code, base) {
    return code.replace(/(src|href)="([^"]*)"/g, function (whole, name, link) {
      try { return name + '="' + new URL(link, base).href + '"'; } catch (e) { return whole; }
    });
  }
  function copyText(text) {
    if (navigator.clipboard && window.isSecureContext) { return navigator.clipboard.writeText(text); }
    return new Promise(function (resolve, reject) {
      var area = document.createElement("textarea");
      area.value = text;
      area.setAttribute("readonly", "readonly");
      area.style.position = "fixed";
      area.style.opacity = "0";
      document.body.appendChild(area);
      area.select();
      var done = false;
      try { done = document.execCommand("copy"); } catch (e) { done = false; }
      document.body.removeChild(area);
      if (done) { resolve(); } else { reject(new Error("copy refused")); }
    });
  }
  function prepare(way) {
    var button = way.querySelector(".embed-copy");
    var status = way.querySelector(".embed-status");
    var code = way.querySelector("textarea");
    var fragment = way.getAttribute("data-fragment");
    if (code) { code.value = fullAddresses(code.value, document.baseURI); }
    if (!button) { return; }
    button.hidden = false;
    button.addEventListener("click", function () {
      status.textContent = "";
      var text;
      if (fragment) {
        var address = new URL(fragment, document.baseURI).href;
        text = fetch(address).then(function (response) {
          if (!response.ok) { throw new Error(response.status); }
          return response.text();
        }).then(function (body) { return fullAddresses(body, address); });
      } else {
        text = Promise.resolve(code.value);
      }
      text.then(copyText).then(function () {
        status.textContent = button.getAttribute("data-copied");
      }, function () {
        status.textContent = button.getAttribute("data-failed");
        if (code) { code.focus(); code.select(); }
      });
    });
  }
  function start() {
    var ways = document.querySelectorAll("[data-embed-way]");
    for (var i = 0; i < ways.length; i++) { prepare(ways[i]); }
  }
  if (document.readyState === "loading") { document.addEventListener("DOMContentLoaded", start); } else { start(); }
})();
