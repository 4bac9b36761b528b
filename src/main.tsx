/**
 * The one entry point, kept tiny: pupils' phones (paths under /join) load only the pupil page,
 * never the staff app with its router, queries, charts and simulation.
 */
const path = window.location.pathname;
const page = path === "/join" || path.startsWith("/join/") ? import("./pupil/pupil-main") : import("./app/staff-main");
page.catch(() => {
  // A half-loaded page (e.g. the server was updated meanwhile): say so rather than stay blank.
  const root = document.getElementById("root");
  if (root) root.textContent = "Linkleap could not load. Check your connection and reload the page.";
});
