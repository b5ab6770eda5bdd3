// The rating grid moves its focus with the arrow keys; keep the browser from also scrolling the page.
const gridKeys = ["ArrowUp", "ArrowDown", "ArrowLeft", "ArrowRight", "Home", "End", " "];

export function keepArrowKeys(grid) {
    if (!grid || grid.dataset.keysKept) {
        return;
    }
    grid.dataset.keysKept = "true";
    grid.addEventListener("keydown", e => {
        if (e.target instanceof HTMLElement && e.target.getAttribute("role") === "gridcell" && gridKeys.includes(e.key)) {
            e.preventDefault();
        }
    });
}
