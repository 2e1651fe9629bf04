/** The place a 3-D surface will take, the same height, while the 2-D views are drawn first. */
export function SurfacePending({ height = 400 }: { height?: number }) {
  return (
    <div className="grid place-items-center text-sm text-slate-500" style={{ height }} aria-busy="true">
      Drawing the 3-D surface…
    </div>
  )
}
