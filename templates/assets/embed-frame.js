// aequa: runs in a map's embed page. Tells the page that frames it how tall the content is, whenever that
// changes (fonts loading, a narrower or wider frame, the key wrapping onto more lines), so that page's
// embed-host.js can make the frame exactly as tall. It sends one number and reads nothing from the host.
(function () {
  "use strict";
  if (window.parent === window) { return; }
  var sent = -1;
  function contentHeight() {
    // the root element's box is as tall as the content (the page sets no height on html or body)
    return Math.ceil(document.documentElement.getBoundingClientRect().height);
  }
  function report(always) {
    var height = contentHeight();
    if (always || height !== sent) {
      sent = height;
      window.parent.postMessage({ type: "aequa-embed-height", height: height }, "*");
    }
  }
  window.addEventListener("message", function (event) {
    if (event.source === window.parent && event.data && event.data.type === "aequa-embed-ask") { report(true); }
  });
  window.addEventListener("resize", function () { report(false); });
  window.addEventListener("load", function () { report(true); });
  if (window.ResizeObserver) {
    new ResizeObserver(function () { report(false); }).observe(document.documentElement);
  }
  report(true);
})();
