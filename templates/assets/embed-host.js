// aequa: include once in a page that shows aequa maps in frames (<iframe data-aequa-embed>). Each framed map
// reports its content's height (embed-frame.js); this script sets that frame's height to it, so the frame
// has neither an inner scroll bar nor a gap below the map, at any width. It accepts a height only from the
// frame's own window, as a plain number between 40 and 20000 pixels, and changes nothing else.
(function () {
  "use strict";
  if (window.aequaEmbedHost) { return; }
  window.aequaEmbedHost = true;
  var SELECTOR = "iframe[data-aequa-embed]";
  function frames() { return document.querySelectorAll(SELECTOR); }
  window.addEventListener("message", function (event) {
    var data = event.data;
    if (!data || data.type !== "aequa-embed-height" || typeof data.height !== "number") { return; }
    if (!isFinite(data.height) || data.height < 40 || data.height > 20000) { return; }
    var list = frames();
    for (var i = 0; i < list.length; i++) {
      if (list[i].contentWindow === event.source) {
        list[i].style.height = Math.ceil(data.height) + "px";
      }
    }
  });
  function ask() {
    var list = frames();
    for (var i = 0; i < list.length; i++) {
      if (list[i].contentWindow) { list[i].contentWindow.postMessage({ type: "aequa-embed-ask" }, "*"); }
    }
  }
  // a frame may have reported before this script ran: ask every frame again now and whenever one loads
  document.addEventListener("load", function (event) {
    if (event.target && event.target.matches && event.target.matches(SELECTOR)) { ask(); }
  }, true);
  if (document.readyState === "loading") { document.addEventListener("DOMContentLoaded", ask); } else { ask(); }
})();
