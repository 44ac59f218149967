;; Trailing update of the blocked LU (src/model/numeric/luFactor.ts, step 3), WebAssembly SIMD:
;;   A22 -= L21 U12 on a row-major n x n matrix of f64 at byte 0 of the memory, for
;;   rows kEnd .. kEnd + 2 floor((n - kEnd) / 2) - 1 (two at a time),
;;   columns kEnd .. kEnd + 2 floor((c1 - kEnd) / 2) - 1 (two lanes of an f64x2),
;;   inner index p in groups of four from k0 ((kEnd - k0) must be a multiple of 4).
;; Each element gets, group by group in increasing p, exactly the TypeScript path's operations
;;   a[i][j] -= ((l[i][p] u[p][j] + l[i][p+1] u[p+1][j]) + l[i][p+2] u[p+2][j]) + l[i][p+3] u[p+3][j]
;; (IEEE-754 lane by lane, no fused multiply-add), so both paths give the same bits; the caller does
;; the odd row and the odd column in TypeScript.
;; Matrix-matrix product as in Golub & Van Loan, Matrix Computations, 4th ed., sec. 1.1 and 3.2.11.
;; Compiled by scripts/buildLuKernel.mjs (wabt) into luKernelWasm.ts; a test checks they agree.
(module
  (memory (export "memory") 1)
  (func (export "update") (param $n i32) (param $k0 i32) (param $kEnd i32) (param $c1 i32)
    (local $i i32) (local $p i32) (local $n8 i32) (local $ri i32) (local $rs i32)
    (local $r0 i32) (local $r1 i32) (local $r2 i32) (local $r3 i32)
    (local $jb i32) (local $je i32) (local $jp i32)
    (local $m0 v128) (local $m1 v128) (local $m2 v128) (local $m3 v128)
    (local $q0 v128) (local $q1 v128) (local $q2 v128) (local $q3 v128)
    (local $u0 v128) (local $u1 v128) (local $u2 v128) (local $u3 v128)
    (local.set $n8 (i32.shl (local.get $n) (i32.const 3)))
    ;; byte offsets of columns: jb from kEnd*8, je = c1*8, jp = end of pairs
    (local.set $je (i32.shl (local.get $c1) (i32.const 3)))
    (local.set $jp (i32.add (i32.shl (local.get $kEnd) (i32.const 3))
       (i32.shl (i32.shr_u (i32.sub (local.get $c1) (local.get $kEnd)) (i32.const 1)) (i32.const 4))))
    (local.set $i (local.get $kEnd))
    (block $done_rows (loop $rows
      (br_if $done_rows (i32.ge_s (i32.add (local.get $i) (i32.const 1)) (local.get $n)))
      (local.set $ri (i32.mul (local.get $i) (local.get $n8)))
      (local.set $rs (i32.add (local.get $ri) (local.get $n8)))
      (local.set $p (local.get $k0))
      (block $done_p (loop $ps
        (br_if $done_p (i32.ge_s (i32.add (local.get $p) (i32.const 3)) (local.get $kEnd)))
        (local.set $m0 (f64x2.splat (f64.load (i32.add (local.get $ri) (i32.shl (local.get $p) (i32.const 3))))))
        (local.set $m1 (f64x2.splat (f64.load offset=8 (i32.add (local.get $ri) (i32.shl (local.get $p) (i32.const 3))))))
        (local.set $m2 (f64x2.splat (f64.load offset=16 (i32.add (local.get $ri) (i32.shl (local.get $p) (i32.const 3))))))
        (local.set $m3 (f64x2.splat (f64.load offset=24 (i32.add (local.get $ri) (i32.shl (local.get $p) (i32.const 3))))))
        (local.set $q0 (f64x2.splat (f64.load (i32.add (local.get $rs) (i32.shl (local.get $p) (i32.const 3))))))
        (local.set $q1 (f64x2.splat (f64.load offset=8 (i32.add (local.get $rs) (i32.shl (local.get $p) (i32.const 3))))))
        (local.set $q2 (f64x2.splat (f64.load offset=16 (i32.add (local.get $rs) (i32.shl (local.get $p) (i32.const 3))))))
        (local.set $q3 (f64x2.splat (f64.load offset=24 (i32.add (local.get $rs) (i32.shl (local.get $p) (i32.const 3))))))
        (local.set $r0 (i32.mul (local.get $p) (local.get $n8)))
        (local.set $r1 (i32.add (local.get $r0) (local.get $n8)))
        (local.set $r2 (i32.add (local.get $r1) (local.get $n8)))
        (local.set $r3 (i32.add (local.get $r2) (local.get $n8)))
        (local.set $jb (i32.shl (local.get $kEnd) (i32.const 3)))
        (block $done_j (loop $js
          (br_if $done_j (i32.ge_u (local.get $jb) (local.get $jp)))
          (local.set $u0 (v128.load (i32.add (local.get $r0) (local.get $jb))))
          (local.set $u1 (v128.load (i32.add (local.get $r1) (local.get $jb))))
          (local.set $u2 (v128.load (i32.add (local.get $r2) (local.get $jb))))
          (local.set $u3 (v128.load (i32.add (local.get $r3) (local.get $jb))))
          (v128.store (i32.add (local.get $ri) (local.get $jb))
            (f64x2.sub (v128.load (i32.add (local.get $ri) (local.get $jb)))
              (f64x2.add (f64x2.add (f64x2.add (f64x2.mul (local.get $m0) (local.get $u0)) (f64x2.mul (local.get $m1) (local.get $u1)))
                 (f64x2.mul (local.get $m2) (local.get $u2))) (f64x2.mul (local.get $m3) (local.get $u3)))))
          (v128.store (i32.add (local.get $rs) (local.get $jb))
            (f64x2.sub (v128.load (i32.add (local.get $rs) (local.get $jb)))
              (f64x2.add (f64x2.add (f64x2.add (f64x2.mul (local.get $q0) (local.get $u0)) (f64x2.mul (local.get $q1) (local.get $u1)))
                 (f64x2.mul (local.get $q2) (local.get $u2))) (f64x2.mul (local.get $q3) (local.get $u3)))))
          (local.set $jb (i32.add (local.get $jb) (i32.const 16)))
          (br $js)))
        (local.set $p (i32.add (local.get $p) (i32.const 4)))
        (br $ps)))
      (local.set $i (i32.add (local.get $i) (i32.const 2)))
      (br $rows)))
  )

  ;; One row i: a[i][j] -= sum over p = p0 .. p0 + 4 floor((p1 - p0) / 4) - 1 of a[i][p] a[p][j], in
  ;; groups of four summed left to right as above, for columns j0 .. j0 + 2 floor((j1 - j0) / 2) - 1.
  ;; (The block-row solve U12 = L11^-1 A12, Golub & Van Loan alg. 3.1.3 row-oriented; the caller does
  ;; the single p and the odd column.)
  (func (export "updateRow") (param $n i32) (param $i i32) (param $p0 i32) (param $p1 i32) (param $j0 i32) (param $j1 i32)
    (local $p i32) (local $n8 i32) (local $ri i32)
    (local $r0 i32) (local $r1 i32) (local $r2 i32) (local $r3 i32)
    (local $jb i32) (local $jp i32)
    (local $m0 v128) (local $m1 v128) (local $m2 v128) (local $m3 v128)
    (local.set $n8 (i32.shl (local.get $n) (i32.const 3)))
    (local.set $ri (i32.mul (local.get $i) (local.get $n8)))
    (local.set $jp (i32.add (i32.shl (local.get $j0) (i32.const 3))
       (i32.shl (i32.shr_u (i32.sub (local.get $j1) (local.get $j0)) (i32.const 1)) (i32.const 4))))
    (local.set $p (local.get $p0))
    (block $done_p (loop $ps
      (br_if $done_p (i32.ge_s (i32.add (local.get $p) (i32.const 3)) (local.get $p1)))
      (local.set $m0 (f64x2.splat (f64.load (i32.add (local.get $ri) (i32.shl (local.get $p) (i32.const 3))))))
      (local.set $m1 (f64x2.splat (f64.load offset=8 (i32.add (local.get $ri) (i32.shl (local.get $p) (i32.const 3))))))
      (local.set $m2 (f64x2.splat (f64.load offset=16 (i32.add (local.get $ri) (i32.shl (local.get $p) (i32.const 3))))))
      (local.set $m3 (f64x2.splat (f64.load offset=24 (i32.add (local.get $ri) (i32.shl (local.get $p) (i32.const 3))))))
      (local.set $r0 (i32.mul (local.get $p) (local.get $n8)))
      (local.set $r1 (i32.add (local.get $r0) (local.get $n8)))
      (local.set $r2 (i32.add (local.get $r1) (local.get $n8)))
      (local.set $r3 (i32.add (local.get $r2) (local.get $n8)))
      (local.set $jb (i32.shl (local.get $j0) (i32.const 3)))
      (block $done_j (loop $js
        (br_if $done_j (i32.ge_u (local.get $jb) (local.get $jp)))
        (v128.store (i32.add (local.get $ri) (local.get $jb))
          (f64x2.sub (v128.load (i32.add (local.get $ri) (local.get $jb)))
            (f64x2.add (f64x2.add (f64x2.add
                  (f64x2.mul (local.get $m0) (v128.load (i32.add (local.get $r0) (local.get $jb))))
                  (f64x2.mul (local.get $m1) (v128.load (i32.add (local.get $r1) (local.get $jb)))))
                (f64x2.mul (local.get $m2) (v128.load (i32.add (local.get $r2) (local.get $jb)))))
              (f64x2.mul (local.get $m3) (v128.load (i32.add (local.get $r3) (local.get $jb)))))))
        (local.set $jb (i32.add (local.get $jb) (i32.const 16)))
        (br $js)))
      (local.set $p (i32.add (local.get $p) (i32.const 4)))
      (br $ps)))
  )
)
