;; Influence matrix of a planar vortex-ring lattice (src/model/lattice/ringInfluenceMatrix.ts), in
;; WebAssembly SIMD: two control points at a time, one per f64x2 lane. Every lane receives exactly the
;; IEEE-754 operations of the TypeScript loops, in the same order (no fused multiply-add, no reordered
;; sums); a branch there (a point inside the cut-off) is a lane select here of the same two values, so
;; both paths give the same bits. The kernels are the y component of the Biot-Savart segment law for
;; coplanar points and the semi-infinite wake leg along -x (Katz & Plotkin, Low-Speed Aerodynamics,
;; 2nd ed., eq. 10.115 and sec. 2.13), with the corner unit vectors shared between segments as in the
;; TypeScript (see its header).
;;
;; Memory (byte offsets given by the caller, each a multiple of 16):
;;   out        n x n f64, row-major, written whole;
;;   edgeZ      spanCount + 1 f64;
;;   lowerX, upperX   spanCount x (chordCount + 1) f64: the strips' corner x on their two edge lines;
;;   ctrlX, ctrlZ     n f64 each;
;;   shared     spanCount i32: 1 where strip s's upper corners are strip s + 1's lower corners;
;;   work       4 corner sets of (chordCount + 1) x 48 bytes, then a two-row buffer of n x 16 bytes.
;; A corner entry (48 bytes): d = px - x, d / r and dz / r for the two lanes (r = |(d, dz)|).
;; Compiled by scripts/buildLuKernel.mjs (wabt) into ringInfluenceKernelWasm.ts; a test checks they agree.
(module
  (memory (export "memory") 1)

  ;; Offsets and unit vectors from the corners x[0 .. cols - 1] of one edge line to the two points.
  (func $corners (param $dst i32) (param $src i32) (param $cols i32) (param $px v128) (param $dz v128)
    (local $m i32) (local $d v128) (local $inv v128) (local $dzSq v128)
    (local.set $dzSq (f64x2.mul (local.get $dz) (local.get $dz)))
    (block $done (loop $next
      (br_if $done (i32.ge_u (local.get $m) (local.get $cols)))
      (local.set $d (f64x2.sub (local.get $px) (v128.load64_splat (local.get $src))))
      (local.set $inv (f64x2.div (f64x2.splat (f64.const 1))
        (f64x2.sqrt (f64x2.add (f64x2.mul (local.get $d) (local.get $d)) (local.get $dzSq)))))
      (v128.store (local.get $dst) (local.get $d))
      (v128.store offset=16 (local.get $dst) (f64x2.mul (local.get $d) (local.get $inv)))
      (v128.store offset=32 (local.get $dst) (f64x2.mul (local.get $dz) (local.get $inv)))
      (local.set $src (i32.add (local.get $src) (i32.const 8)))
      (local.set $dst (i32.add (local.get $dst) (i32.const 48)))
      (local.set $m (i32.add (local.get $m) (i32.const 1)))
      (br $next)))
  )

  ;; A strip's rings (lower edge line: corner set $low at dz0; upper: $up at dz1) added into the two-row
  ;; buffer from entry $o on: added for the real strip, subtracted for the ground image ($image = 1;
  ;; x - y is x + (-1) y exactly, as the TypeScript's sign * term).
  (func $strip (param $o i32) (param $cc i32) (param $low i32) (param $up i32)
    (param $dz0 v128) (param $dz1 v128) (param $image i32)
    (local $m i32) (local $k0 v128) (local $k1 v128) (local $dz0Sq v128) (local $dz1Sq v128)
    (local $r1x v128) (local $u1x v128) (local $r2x v128) (local $u2x v128)
    (local $c v128) (local $r0x v128) (local $r0z v128) (local $l2 v128)
    (local $span v128) (local $upper v128) (local $lower v128) (local $r0 v128) (local $wake v128)
    (local.set $k0 (f64x2.div (f64x2.splat (f64.const 1)) (f64x2.mul (f64x2.splat (f64.const 0x1.921fb54442d18p+3)) (local.get $dz0))))
    (local.set $k1 (f64x2.div (f64x2.splat (f64.const 1)) (f64x2.mul (f64x2.splat (f64.const 0x1.921fb54442d18p+3)) (local.get $dz1))))
    (local.set $dz0Sq (f64x2.mul (local.get $dz0) (local.get $dz0)))
    (local.set $dz1Sq (f64x2.mul (local.get $dz1) (local.get $dz1)))
    (local.set $r0z (f64x2.sub (local.get $dz0) (local.get $dz1)))
    (block $done (loop $next
      (br_if $done (i32.ge_u (local.get $m) (local.get $cc)))
      (local.set $r1x (v128.load (local.get $low)))
      (local.set $u1x (v128.load offset=16 (local.get $low)))
      (local.set $r2x (v128.load (local.get $up)))
      (local.set $u2x (v128.load offset=16 (local.get $up)))
      ;; spanwise segment: lower corner m -> upper corner m
      (local.set $c (f64x2.sub (f64x2.mul (local.get $dz0) (local.get $r2x)) (f64x2.mul (local.get $r1x) (local.get $dz1))))
      (local.set $r0x (f64x2.sub (local.get $r1x) (local.get $r2x)))
      (local.set $l2 (f64x2.add (f64x2.mul (local.get $r0x) (local.get $r0x)) (f64x2.mul (local.get $r0z) (local.get $r0z))))
      (local.set $span (v128.bitselect
        (f64x2.div
          (f64x2.add
            (f64x2.mul (local.get $r0x) (f64x2.sub (local.get $u1x) (local.get $u2x)))
            (f64x2.mul (local.get $r0z) (f64x2.sub (v128.load offset=32 (local.get $low)) (v128.load offset=32 (local.get $up)))))
          (f64x2.mul (f64x2.splat (f64.const 0x1.921fb54442d18p+3)) (local.get $c)))
        (v128.const i64x2 0 0)
        (f64x2.gt (f64x2.mul (local.get $c) (local.get $c))
          (f64x2.mul (f64x2.mul (f64x2.splat (f64.const 0x1.79ca10c924224p-67)) (local.get $l2)) (local.get $l2)))))
      ;; chordwise sides along the upper (+) and lower (-) edge lines
      (local.set $r0 (f64x2.sub (local.get $r2x) (v128.load offset=48 (local.get $up))))
      (local.set $upper (v128.bitselect
        (f64x2.mul (f64x2.sub (v128.load offset=64 (local.get $up)) (local.get $u2x)) (local.get $k1))
        (v128.const i64x2 0 0)
        (f64x2.gt (local.get $dz1Sq)
          (f64x2.mul (f64x2.mul (f64x2.splat (f64.const 0x1.79ca10c924224p-67)) (local.get $r0)) (local.get $r0)))))
      (local.set $r0 (f64x2.sub (local.get $r1x) (v128.load offset=48 (local.get $low))))
      (local.set $lower (v128.bitselect
        (f64x2.mul (f64x2.sub (v128.load offset=64 (local.get $low)) (local.get $u1x)) (local.get $k0))
        (v128.const i64x2 0 0)
        (f64x2.gt (local.get $dz0Sq)
          (f64x2.mul (f64x2.mul (f64x2.splat (f64.const 0x1.79ca10c924224p-67)) (local.get $r0)) (local.get $r0)))))
      (local.set $r0 (f64x2.sub (f64x2.add (local.get $span) (local.get $upper)) (local.get $lower)))
      (if (local.get $image)
        (then (v128.store (local.get $o) (f64x2.sub (v128.load (local.get $o)) (local.get $r0))))
        (else (v128.store (local.get $o) (f64x2.add (v128.load (local.get $o)) (local.get $r0)))))
      ;; the same segment is ring m - 1's trailing side
      (if (local.get $m) (then
        (if (local.get $image)
          (then (v128.store (i32.sub (local.get $o) (i32.const 16))
            (f64x2.add (v128.load (i32.sub (local.get $o) (i32.const 16))) (local.get $span))))
          (else (v128.store (i32.sub (local.get $o) (i32.const 16))
            (f64x2.sub (v128.load (i32.sub (local.get $o) (i32.const 16))) (local.get $span)))))))
      (local.set $low (i32.add (local.get $low) (i32.const 48)))
      (local.set $up (i32.add (local.get $up) (i32.const 48)))
      (local.set $o (i32.add (local.get $o) (i32.const 16)))
      (local.set $m (i32.add (local.get $m) (i32.const 1)))
      (br $next)))
    ;; wake legs from the trailing corners (now at $low, $up) along -x, on the last ring (entry $o - 1)
    (local.set $wake (v128.const i64x2 0 0))
    (local.set $r0 (v128.load (local.get $up)))
    (local.set $wake (v128.bitselect
      (f64x2.add (local.get $wake)
        (f64x2.mul (f64x2.sub (f64x2.splat (f64.const 1)) (v128.load offset=16 (local.get $up))) (local.get $k1)))
      (local.get $wake)
      (f64x2.gt (local.get $dz1Sq) (f64x2.mul (f64x2.splat (f64.const 0x1.79ca10c924224p-67))
        (f64x2.add (f64x2.mul (local.get $r0) (local.get $r0)) (local.get $dz1Sq))))))
    (local.set $r0 (v128.load (local.get $low)))
    (local.set $wake (v128.bitselect
      (f64x2.sub (local.get $wake)
        (f64x2.mul (f64x2.sub (f64x2.splat (f64.const 1)) (v128.load offset=16 (local.get $low))) (local.get $k0)))
      (local.get $wake)
      (f64x2.gt (local.get $dz0Sq) (f64x2.mul (f64x2.splat (f64.const 0x1.79ca10c924224p-67))
        (f64x2.add (f64x2.mul (local.get $r0) (local.get $r0)) (local.get $dz0Sq))))))
    (local.set $o (i32.sub (local.get $o) (i32.const 16)))
    (if (local.get $image)
      (then (v128.store (local.get $o) (f64x2.sub (v128.load (local.get $o)) (local.get $wake))))
      (else (v128.store (local.get $o) (f64x2.add (v128.load (local.get $o)) (local.get $wake)))))
  )

  (func (export "build")
    (param $spanCount i32) (param $cc i32) (param $ground i32) (param $g2 f64)
    (param $out i32) (param $edgeZ i32) (param $lowerX i32) (param $upperX i32)
    (param $ctrlX i32) (param $ctrlZ i32) (param $shared i32) (param $work i32)
    (local $n i32) (local $cols48 i32) (local $cols8 i32) (local $i i32) (local $i2 i32) (local $s i32)
    (local $buf i32) (local $b i32) (local $j i32) (local $row i32) (local $row2 i32)
    (local $low i32) (local $up i32) (local $imageLow i32) (local $imageUp i32) (local $t i32)
    (local $carried i32) (local $nodes i32)
    (local $px v128) (local $pz v128) (local $z0 f64) (local $z1 f64)
    (local $dz0 v128) (local $dz1 v128) (local $idz0 v128) (local $idz1 v128)
    (local.set $n (i32.mul (local.get $spanCount) (local.get $cc)))
    (local.set $cols8 (i32.shl (i32.add (local.get $cc) (i32.const 1)) (i32.const 3)))
    (local.set $cols48 (i32.mul (i32.add (local.get $cc) (i32.const 1)) (i32.const 48)))
    (local.set $buf (i32.add (local.get $work) (i32.shl (local.get $cols48) (i32.const 2))))
    (block $done_points (loop $points
      (br_if $done_points (i32.ge_u (local.get $i) (local.get $n)))
      ;; lanes: points i and i2 = i + 1 (i itself for an odd last point)
      (local.set $i2 (select (i32.add (local.get $i) (i32.const 1)) (local.get $i)
        (i32.lt_u (i32.add (local.get $i) (i32.const 1)) (local.get $n))))
      (local.set $px (f64x2.replace_lane 1
        (v128.load64_splat (i32.add (local.get $ctrlX) (i32.shl (local.get $i) (i32.const 3))))
        (f64.load (i32.add (local.get $ctrlX) (i32.shl (local.get $i2) (i32.const 3))))))
      (local.set $pz (f64x2.replace_lane 1
        (v128.load64_splat (i32.add (local.get $ctrlZ) (i32.shl (local.get $i) (i32.const 3))))
        (f64.load (i32.add (local.get $ctrlZ) (i32.shl (local.get $i2) (i32.const 3))))))
      (memory.fill (local.get $buf) (i32.const 0) (i32.shl (local.get $n) (i32.const 4)))
      (local.set $low (local.get $work))
      (local.set $up (i32.add (local.get $low) (local.get $cols48)))
      (local.set $imageLow (i32.add (local.get $up) (local.get $cols48)))
      (local.set $imageUp (i32.add (local.get $imageLow) (local.get $cols48)))
      (local.set $carried (i32.const 0))
      (local.set $s (i32.const 0))
      (block $done_strips (loop $strips
        (br_if $done_strips (i32.ge_u (local.get $s) (local.get $spanCount)))
        (local.set $z0 (f64.load (i32.add (local.get $edgeZ) (i32.shl (local.get $s) (i32.const 3)))))
        (local.set $z1 (f64.load offset=8 (i32.add (local.get $edgeZ) (i32.shl (local.get $s) (i32.const 3)))))
        (local.set $nodes (i32.mul (local.get $s) (local.get $cols8)))
        (local.set $b (i32.add (local.get $buf) (i32.shl (i32.mul (local.get $s) (local.get $cc)) (i32.const 4))))
        (local.set $dz0 (f64x2.sub (local.get $pz) (f64x2.splat (local.get $z0))))
        (local.set $dz1 (f64x2.sub (local.get $pz) (f64x2.splat (local.get $z1))))
        (if (i32.eqz (local.get $carried)) (then
          (call $corners (local.get $low) (i32.add (local.get $lowerX) (local.get $nodes))
            (i32.add (local.get $cc) (i32.const 1)) (local.get $px) (local.get $dz0))))
        (call $corners (local.get $up) (i32.add (local.get $upperX) (local.get $nodes))
          (i32.add (local.get $cc) (i32.const 1)) (local.get $px) (local.get $dz1))
        (call $strip (local.get $b) (local.get $cc) (local.get $low) (local.get $up)
          (local.get $dz0) (local.get $dz1) (i32.const 0))
        ;; the image strip: edge lines mirrored to z' = 2 g - z
        (if (local.get $ground) (then
          (local.set $idz0 (f64x2.sub (local.get $pz) (f64x2.splat (f64.sub (local.get $g2) (local.get $z0)))))
          (local.set $idz1 (f64x2.sub (local.get $pz) (f64x2.splat (f64.sub (local.get $g2) (local.get $z1)))))
          (if (i32.eqz (local.get $carried)) (then
            (call $corners (local.get $imageLow) (i32.add (local.get $lowerX) (local.get $nodes))
              (i32.add (local.get $cc) (i32.const 1)) (local.get $px) (local.get $idz0))))
          (call $corners (local.get $imageUp) (i32.add (local.get $upperX) (local.get $nodes))
            (i32.add (local.get $cc) (i32.const 1)) (local.get $px) (local.get $idz1))
          (call $strip (local.get $b) (local.get $cc) (local.get $imageLow) (local.get $imageUp)
            (local.get $idz0) (local.get $idz1) (i32.const 1))))
        ;; shared corners and the same dz: the next strip's lower sets are these upper ones
        (local.set $carried (i32.and
          (i32.lt_u (i32.add (local.get $s) (i32.const 1)) (local.get $spanCount))
          (i32.ne (i32.load (i32.add (local.get $shared) (i32.shl (local.get $s) (i32.const 2)))) (i32.const 0))))
        (if (local.get $carried) (then
          (local.set $t (local.get $low)) (local.set $low (local.get $up)) (local.set $up (local.get $t))
          (local.set $t (local.get $imageLow)) (local.set $imageLow (local.get $imageUp)) (local.set $imageUp (local.get $t))))
        (local.set $s (i32.add (local.get $s) (i32.const 1)))
        (br $strips)))
      ;; the two rows out of the buffer (lane 1 last, so an odd last point keeps lane 0's equal value)
      (local.set $row (i32.add (local.get $out) (i32.shl (i32.mul (local.get $i) (local.get $n)) (i32.const 3))))
      (local.set $row2 (i32.add (local.get $out) (i32.shl (i32.mul (local.get $i2) (local.get $n)) (i32.const 3))))
      (local.set $j (i32.const 0))
      (block $done_copy (loop $copy
        (br_if $done_copy (i32.ge_u (local.get $j) (local.get $n)))
        (local.set $b (i32.add (local.get $buf) (i32.shl (local.get $j) (i32.const 4))))
        (v128.store64_lane 0 (local.get $row) (v128.load (local.get $b)))
        (v128.store64_lane 1 (local.get $row2) (v128.load (local.get $b)))
        (local.set $row (i32.add (local.get $row) (i32.const 8)))
        (local.set $row2 (i32.add (local.get $row2) (i32.const 8)))
        (local.set $j (i32.add (local.get $j) (i32.const 1)))
        (br $copy)))
      (local.set $i (i32.add (local.get $i) (i32.const 2)))
      (br $points)))
  )
)
