/**
 * Index arithmetic of a heat-recovery plan's duty grid: points are stored lexicographically over the sweeps,
 * the first pump-around's duty varying slowest (index = ((i0·n1) + i1)·n2 + i2).
 */
export function gridIndex(axes: number[][], at: number[]): number {
  return at.reduce((acc, i, k) => acc * axes[k]!.length + i, 0);
}

/** Position of the grid node nearest to a set of duties (each axis on its own). */
export function nearestPosition(axes: number[][], duties: number[]): number[] {
  return axes.map((ax, k) => {
    let best = 0;
    ax.forEach((d, i) => {
      if (Math.abs(d - duties[k]!) < Math.abs(ax[best]! - duties[k]!)) best = i;
    });
    return best;
  });
}
