// aequa: optional hover highlight and tooltip for the maps. The pages work fully without it: every
// region also has an SVG <title> and every figure is in the table page.
(function () {
  "use strict";
  function regionOf(node, frame) {
    while (node && node !== frame) {
      if (node.id && node.id.indexOf("r-") === 0) { return node; }
      node = node.parentNode;
    }
    return null;
  }
  function textOf(region) {
    var title = region.querySelector("title");
    if (title && title.textContent) { return title.textContent; }
    var name = region.getAttribute("data-name") || region.id.substring(2);
    var value = region.getAttribute("data-value");
    return value ? name + ": " + value : name;
  }
  function attach(frame) {
    var tip = document.createElement("div");
    tip.className = "map-tip";
    tip.setAttribute("aria-hidden", "true");
    tip.hidden = true;
    document.body.appendChild(tip);
    var lit = null;
    frame.addEventListener("pointermove", function (event) {
      var region = regionOf(event.target, frame);
      if (region !== lit) {
        if (lit) { lit.classList.remove("is-lit"); }
        lit = region;
        if (lit) { lit.classList.add("is-lit"); tip.textContent = textOf(lit); }
      }
      tip.hidden = !lit;
      if (lit) {
        tip.style.left = Math.min(event.clientX + 12, window.innerWidth - tip.offsetWidth - 4) + "px";
        tip.style.top = (event.clientY + 12) + "px";
      }
    });
    frame.addEventListener("pointerleave", function () {
      if (lit) { lit.classList.remove("is-lit"); lit = null; }
      tip.hidden = true;
    });
  }
  document.addEventListener("DOMContentLoaded", function () {
    var frames = document.querySelectorAll(".map-frame");
    for (var i = 0; i < frames.length; i++) { attach(frames[i]); }
  });
})();
