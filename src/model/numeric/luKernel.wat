;; Trailing update of the blocked LU (src/model/numeric/luFactor.ts, step 3), WebAssembly SIMD:
;;   A22 -= L21 U12 on a row-major n x n matrix of f64 at byte 0 of the memory, for all rows
;;   kEnd .. n - 1 and all columns kEnd .. c1 - 1, inner index p from k0 to kEnd - 1 in groups of four
;;   ((kEnd - k0) must be a multiple of 4). The memory must hold n n + 8 + 4 (kEnd - k0) values: the
;;   multipliers of two rows are packed after the matrix (byte n n 8 + 64 on).
;; Each element gets, group by group in increasing p, exactly the TypeScript path's operations
;;   a[i][j] -= ((l[i][p] u[p][j] + l[i][p+1] u[p+1][j]) + l[i][p+2] u[p+2][j]) + l[i][p+3] u[p+3][j]
;; (IEEE-754 lane by lane, no fused multiply-add), so both paths give the same bits. Only the place
;; where a[i][j] waits between the groups differs: a register here, the matrix in TypeScript.
;; Register blocking (Goto & van de Geijn, "Anatomy of high-performance matrix multiplication", ACM
;; TOMS 34(3), 2008: a micro-kernel keeps a tile of the result in registers while it streams the
;; operands): a tile of two rows by four columns (four f64x2) stays in registers for all of p, with
;; four f64x2 group sums beside it, 12 of the 16 vector registers an x86-64 engine has. One p per
;; loop iteration keeps the engine from loading every operand of a group ahead of its use (which
;; spills). The two rows' multipliers are packed side by side, so one pointer serves both splats.
;; The last tile of a row pair may be 1 to 3 columns wide: it is computed four wide (reading past
;; c1, into the matrix or the packed area, values that are never stored) and only its columns below
;; c1 are stored. An odd last row is computed as a pair with itself (same values, stored twice).
;; Matrix-matrix product as in Golub & Van Loan, Matrix Computations, 4th ed., sec. 1.1 and 3.2.11.
;; Compiled by scripts/buildLuKernel.mjs (wabt) into luKernelWasm.ts; a test checks they agree.
(module
  (memory (export "memory") 1)
  (func (export "update") (param $n i32) (param $k0 i32) (param $kEnd i32) (param $c1 i32)
    (local $n8 i32) (local $i i32) (local $r0 i32) (local $r1 i32)
    (local $jb i32) (local $jb0 i32) (local $je i32) (local $rem i32)
    (local $ub i32) (local $up i32) (local $lb i32) (local $le i32)
    (local $pk i32) (local $pe i32) (local $lp i32) (local $qe i32)
    (local $a00 v128) (local $a01 v128) (local $a10 v128) (local $a11 v128)
    (local $t00 v128) (local $t01 v128) (local $t10 v128) (local $t11 v128)
    (local $u0 v128) (local $u1 v128) (local $s0 v128) (local $s1 v128)
    (local.set $n8 (i32.shl (local.get $n) (i32.const 3)))
    (local.set $jb0 (i32.shl (local.get $kEnd) (i32.const 3)))
    (local.set $je (i32.shl (local.get $c1) (i32.const 3)))
    (local.set $ub (i32.mul (local.get $k0) (local.get $n8)))
    (local.set $lb (i32.shl (local.get $k0) (i32.const 3)))
    (local.set $le (local.get $jb0))
    (local.set $pk (i32.add (i32.mul (local.get $n) (local.get $n8)) (i32.const 64)))
    (local.set $pe (i32.add (local.get $pk) (i32.shl (i32.sub (local.get $kEnd) (local.get $k0)) (i32.const 4))))
    (local.set $i (local.get $kEnd))
    (block $done_rows (loop $rows
      (br_if $done_rows (i32.ge_s (local.get $i) (local.get $n)))
      (local.set $r0 (i32.mul (local.get $i) (local.get $n8)))
      (local.set $r1 (select (i32.add (local.get $r0) (local.get $n8)) (local.get $r0)
        (i32.lt_s (i32.add (local.get $i) (i32.const 1)) (local.get $n))))
      ;; pack the multipliers l[r0][p], l[r1][p] side by side for p = k0 .. kEnd - 1
      (local.set $lp (local.get $pk))
      (local.set $jb (local.get $lb))
      (block $done_pack (loop $pack
        (br_if $done_pack (i32.ge_u (local.get $jb) (local.get $le)))
        (f64.store (local.get $lp) (f64.load (i32.add (local.get $r0) (local.get $jb))))
        (f64.store offset=8 (local.get $lp) (f64.load (i32.add (local.get $r1) (local.get $jb))))
        (local.set $lp (i32.add (local.get $lp) (i32.const 16)))
        (local.set $jb (i32.add (local.get $jb) (i32.const 8)))
        (br $pack)))
      (local.set $jb (local.get $jb0))
      (block $done_cols (loop $cols
        (br_if $done_cols (i32.ge_u (local.get $jb) (local.get $je)))
        (local.set $a00 (v128.load (i32.add (local.get $r0) (local.get $jb))))
        (local.set $a01 (v128.load offset=16 (i32.add (local.get $r0) (local.get $jb))))
        (local.set $a10 (v128.load (i32.add (local.get $r1) (local.get $jb))))
        (local.set $a11 (v128.load offset=16 (i32.add (local.get $r1) (local.get $jb))))
        (local.set $up (i32.add (local.get $ub) (local.get $jb)))
        (local.set $lp (local.get $pk))
        (loop $groups
          ;; first p of the group: the group sums start as the products
          (local.set $u0 (v128.load (local.get $up)))
          (local.set $u1 (v128.load offset=16 (local.get $up)))
          (local.set $s0 (v128.load64_splat (local.get $lp)))
          (local.set $s1 (v128.load64_splat offset=8 (local.get $lp)))
          (local.set $t00 (f64x2.mul (local.get $s0) (local.get $u0)))
          (local.set $t01 (f64x2.mul (local.get $s0) (local.get $u1)))
          (local.set $t10 (f64x2.mul (local.get $s1) (local.get $u0)))
          (local.set $t11 (f64x2.mul (local.get $s1) (local.get $u1)))
          (local.set $up (i32.add (local.get $up) (local.get $n8)))
          (local.set $lp (i32.add (local.get $lp) (i32.const 16)))
          (local.set $qe (i32.add (local.get $lp) (i32.const 48)))
          ;; the group's other three p, added left to right
          (loop $rest
            (local.set $u0 (v128.load (local.get $up)))
            (local.set $u1 (v128.load offset=16 (local.get $up)))
            (local.set $s0 (v128.load64_splat (local.get $lp)))
            (local.set $s1 (v128.load64_splat offset=8 (local.get $lp)))
            (local.set $t00 (f64x2.add (local.get $t00) (f64x2.mul (local.get $s0) (local.get $u0))))
            (local.set $t01 (f64x2.add (local.get $t01) (f64x2.mul (local.get $s0) (local.get $u1))))
            (local.set $t10 (f64x2.add (local.get $t10) (f64x2.mul (local.get $s1) (local.get $u0))))
            (local.set $t11 (f64x2.add (local.get $t11) (f64x2.mul (local.get $s1) (local.get $u1))))
            (local.set $up (i32.add (local.get $up) (local.get $n8)))
            (local.set $lp (i32.add (local.get $lp) (i32.const 16)))
            (br_if $rest (i32.lt_u (local.get $lp) (local.get $qe))))
          (local.set $a00 (f64x2.sub (local.get $a00) (local.get $t00)))
          (local.set $a01 (f64x2.sub (local.get $a01) (local.get $t01)))
          (local.set $a10 (f64x2.sub (local.get $a10) (local.get $t10)))
          (local.set $a11 (f64x2.sub (local.get $a11) (local.get $t11)))
          (br_if $groups (i32.lt_u (local.get $lp) (local.get $pe))))
        (local.set $rem (i32.sub (local.get $je) (local.get $jb)))
        (if (i32.ge_u (local.get $rem) (i32.const 32))
          (then
            (v128.store (i32.add (local.get $r0) (local.get $jb)) (local.get $a00))
            (v128.store offset=16 (i32.add (local.get $r0) (local.get $jb)) (local.get $a01))
            (v128.store (i32.add (local.get $r1) (local.get $jb)) (local.get $a10))
            (v128.store offset=16 (i32.add (local.get $r1) (local.get $jb)) (local.get $a11)))
          (else
            (if (i32.ge_u (local.get $rem) (i32.const 16))
              (then
                (v128.store (i32.add (local.get $r0) (local.get $jb)) (local.get $a00))
                (v128.store (i32.add (local.get $r1) (local.get $jb)) (local.get $a10)))
              (else
                (v128.store64_lane 0 (i32.add (local.get $r0) (local.get $jb)) (local.get $a00))
                (v128.store64_lane 0 (i32.add (local.get $r1) (local.get $jb)) (local.get $a10))))
            (if (i32.ge_u (local.get $rem) (i32.const 24))
              (then
                (v128.store64_lane offset=16 0 (i32.add (local.get $r0) (local.get $jb)) (local.get $a01))
                (v128.store64_lane offset=16 0 (i32.add (local.get $r1) (local.get $jb)) (local.get $a11))))))
        (local.set $jb (i32.add (local.get $jb) (i32.const 32)))
        (br $cols)))
      (local.set $i (i32.add (local.get $i) (i32.const 2)))
      (br $rows)))
  )

  ;; Block row of U: U12 = L11^-1 A12 on rows k0 + 1 .. kEnd - 1, columns kEnd .. c1 - 1 (luFactor.ts,
  ;; solveBlockRow; Golub & Van Loan alg. 3.1.3, row-oriented): row i gets, element by element,
  ;;   a[i][j] -= ((l[i][p] u[p][j] + l[i][p+1] u[p+1][j]) + l[i][p+2] u[p+2][j]) + l[i][p+3] u[p+3][j]
  ;; for the groups of four p from k0 below i, then a[i][j] -= l[i][p] u[p][j] for the single p left,
  ;; as the TypeScript updateRow; columns two at a time, an odd last column alone.
  (func (export "blockRow") (param $n i32) (param $k0 i32) (param $kEnd i32) (param $c1 i32)
    (local $n8 i32) (local $i i32) (local $p i32) (local $ri i32) (local $lp i32)
    (local $r0 i32) (local $r1 i32) (local $r2 i32) (local $r3 i32)
    (local $jb i32) (local $jp i32) (local $je i32)
    (local $m0 v128) (local $m1 v128) (local $m2 v128) (local $m3 v128)
    (local $f0 f64) (local $f1 f64) (local $f2 f64) (local $f3 f64)
    (local.set $n8 (i32.shl (local.get $n) (i32.const 3)))
    (local.set $je (i32.shl (local.get $c1) (i32.const 3)))
    (local.set $jp (i32.add (i32.shl (local.get $kEnd) (i32.const 3))
      (i32.shl (i32.shr_u (i32.sub (local.get $c1) (local.get $kEnd)) (i32.const 1)) (i32.const 4))))
    (local.set $i (i32.add (local.get $k0) (i32.const 1)))
    (block $done_rows (loop $rows
      (br_if $done_rows (i32.ge_s (local.get $i) (local.get $kEnd)))
      (local.set $ri (i32.mul (local.get $i) (local.get $n8)))
      (local.set $p (local.get $k0))
      ;; groups of four p
      (block $done_groups (loop $groups
        (br_if $done_groups (i32.ge_s (i32.add (local.get $p) (i32.const 3)) (local.get $i)))
        (local.set $lp (i32.add (local.get $ri) (i32.shl (local.get $p) (i32.const 3))))
        (local.set $f0 (f64.load (local.get $lp)))
        (local.set $f1 (f64.load offset=8 (local.get $lp)))
        (local.set $f2 (f64.load offset=16 (local.get $lp)))
        (local.set $f3 (f64.load offset=24 (local.get $lp)))
        (local.set $m0 (f64x2.splat (local.get $f0)))
        (local.set $m1 (f64x2.splat (local.get $f1)))
        (local.set $m2 (f64x2.splat (local.get $f2)))
        (local.set $m3 (f64x2.splat (local.get $f3)))
        (local.set $r0 (i32.mul (local.get $p) (local.get $n8)))
        (local.set $r1 (i32.add (local.get $r0) (local.get $n8)))
        (local.set $r2 (i32.add (local.get $r1) (local.get $n8)))
        (local.set $r3 (i32.add (local.get $r2) (local.get $n8)))
        (local.set $jb (i32.shl (local.get $kEnd) (i32.const 3)))
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
        (if (i32.lt_u (local.get $jb) (local.get $je)) (then
          (f64.store (i32.add (local.get $ri) (local.get $jb))
            (f64.sub (f64.load (i32.add (local.get $ri) (local.get $jb)))
              (f64.add (f64.add (f64.add
                    (f64.mul (local.get $f0) (f64.load (i32.add (local.get $r0) (local.get $jb))))
                    (f64.mul (local.get $f1) (f64.load (i32.add (local.get $r1) (local.get $jb)))))
                  (f64.mul (local.get $f2) (f64.load (i32.add (local.get $r2) (local.get $jb)))))
                (f64.mul (local.get $f3) (f64.load (i32.add (local.get $r3) (local.get $jb)))))))))
        (local.set $p (i32.add (local.get $p) (i32.const 4)))
        (br $groups)))
      ;; single p
      (block $done_singles (loop $singles
        (br_if $done_singles (i32.ge_s (local.get $p) (local.get $i)))
        (local.set $f0 (f64.load (i32.add (local.get $ri) (i32.shl (local.get $p) (i32.const 3)))))
        (local.set $m0 (f64x2.splat (local.get $f0)))
        (local.set $r0 (i32.mul (local.get $p) (local.get $n8)))
        (local.set $jb (i32.shl (local.get $kEnd) (i32.const 3)))
        (block $done_j1 (loop $js1
          (br_if $done_j1 (i32.ge_u (local.get $jb) (local.get $jp)))
          (v128.store (i32.add (local.get $ri) (local.get $jb))
            (f64x2.sub (v128.load (i32.add (local.get $ri) (local.get $jb)))
              (f64x2.mul (local.get $m0) (v128.load (i32.add (local.get $r0) (local.get $jb))))))
          (local.set $jb (i32.add (local.get $jb) (i32.const 16)))
          (br $js1)))
        (if (i32.lt_u (local.get $jb) (local.get $je)) (then
          (f64.store (i32.add (local.get $ri) (local.get $jb))
            (f64.sub (f64.load (i32.add (local.get $ri) (local.get $jb)))
              (f64.mul (local.get $f0) (f64.load (i32.add (local.get $r0) (local.get $jb))))))))
        (local.set $p (i32.add (local.get $p) (i32.const 1)))
        (br $singles)))
      (local.set $i (i32.add (local.get $i) (i32.const 1)))
      (br $rows)))
  )

  ;; Unblocked partial-pivoting LU of columns k0 .. kEnd - 1, rows k0 .. n - 1 (luFactor.ts, factorPanel:
  ;; Golub & Van Loan alg. 3.4.1), the same operations in the same order: pivot search by strict
  ;; comparison riding along with the elimination, whole-row interchanges, multipliers l = a[i][k] (1 / a[k][k]),
  ;; a[i][j] -= l a[k][j] where l != 0. pivots[k] (i32 at byte $piv + 4 k) is the row swapped with k.
  ;; Returns -1, or the column k whose largest |a| is zero or not finite (that value is left at byte
  ;; n n 8 for the caller's message).
  (func (export "panel") (param $n i32) (param $k0 i32) (param $kEnd i32) (param $piv i32) (result i32)
    (local $n8 i32) (local $k i32) (local $p i32) (local $i i32) (local $j i32) (local $next i32) (local $nextP i32)
    (local $rk i32) (local $rp i32) (local $ri i32) (local $end i32)
    (local $big f64) (local $nextBig f64) (local $v f64) (local $inv f64) (local $l f64) (local $t v128) (local $lv v128)
    (local.set $n8 (i32.shl (local.get $n) (i32.const 3)))
    (local.set $p (local.get $k0))
    (local.set $big (f64.abs (f64.load (i32.add (i32.mul (local.get $k0) (local.get $n8)) (i32.shl (local.get $k0) (i32.const 3))))))
    (local.set $i (i32.add (local.get $k0) (i32.const 1)))
    (block $done_search (loop $search
      (br_if $done_search (i32.ge_s (local.get $i) (local.get $n)))
      (local.set $v (f64.abs (f64.load (i32.add (i32.mul (local.get $i) (local.get $n8)) (i32.shl (local.get $k0) (i32.const 3))))))
      (if (f64.gt (local.get $v) (local.get $big)) (then (local.set $big (local.get $v)) (local.set $p (local.get $i))))
      (local.set $i (i32.add (local.get $i) (i32.const 1)))
      (br $search)))
    (local.set $k (local.get $k0))
    (block $done_cols (loop $cols
      (br_if $done_cols (i32.ge_s (local.get $k) (local.get $kEnd)))
      (if (i32.or (i32.eqz (f64.gt (local.get $big) (f64.const 0))) (f64.eq (local.get $big) (f64.const inf)))
        (then
          (f64.store (i32.mul (local.get $n) (local.get $n8)) (local.get $big))
          (return (local.get $k))))
      (i32.store (i32.add (local.get $piv) (i32.shl (local.get $k) (i32.const 2))) (local.get $p))
      (local.set $rk (i32.mul (local.get $k) (local.get $n8)))
      (if (i32.ne (local.get $p) (local.get $k)) (then
        ;; interchange rows k and p (all n columns; moves are exact, two at a time)
        (local.set $rp (i32.mul (local.get $p) (local.get $n8)))
        (local.set $end (i32.add (local.get $rk) (i32.shl (i32.shr_u (local.get $n) (i32.const 1)) (i32.const 4))))
        (local.set $j (local.get $rk))
        (block $done_swap (loop $swap
          (br_if $done_swap (i32.ge_u (local.get $j) (local.get $end)))
          (local.set $t (v128.load (local.get $j)))
          (v128.store (local.get $j) (v128.load (local.get $rp)))
          (v128.store (local.get $rp) (local.get $t))
          (local.set $j (i32.add (local.get $j) (i32.const 16)))
          (local.set $rp (i32.add (local.get $rp) (i32.const 16)))
          (br $swap)))
        (if (i32.and (local.get $n) (i32.const 1)) (then
          (local.set $v (f64.load (local.get $j)))
          (f64.store (local.get $j) (f64.load (local.get $rp)))
          (f64.store (local.get $rp) (local.get $v))))))
      (local.set $inv (f64.div (f64.const 1) (f64.load (i32.add (local.get $rk) (i32.shl (local.get $k) (i32.const 3))))))
      (local.set $next (i32.add (local.get $k) (i32.const 1)))
      (local.set $nextP (local.get $next))
      (local.set $nextBig (f64.const 0))
      (local.set $i (local.get $next))
      (block $done_rows (loop $rows
        (br_if $done_rows (i32.ge_s (local.get $i) (local.get $n)))
        (local.set $ri (i32.mul (local.get $i) (local.get $n8)))
        (local.set $l (f64.mul (f64.load (i32.add (local.get $ri) (i32.shl (local.get $k) (i32.const 3)))) (local.get $inv)))
        (f64.store (i32.add (local.get $ri) (i32.shl (local.get $k) (i32.const 3))) (local.get $l))
        (if (f64.ne (local.get $l) (f64.const 0)) (then
          ;; two columns at a time (each lane the scalar operations: l a[k][j], then the subtraction),
          ;; an odd last column alone
          (local.set $lv (f64x2.splat (local.get $l)))
          (local.set $j (local.get $next))
          (block $done_j2 (loop $js2
            (br_if $done_j2 (i32.ge_s (i32.add (local.get $j) (i32.const 1)) (local.get $kEnd)))
            (v128.store (i32.add (local.get $ri) (i32.shl (local.get $j) (i32.const 3)))
              (f64x2.sub (v128.load (i32.add (local.get $ri) (i32.shl (local.get $j) (i32.const 3))))
                (f64x2.mul (local.get $lv) (v128.load (i32.add (local.get $rk) (i32.shl (local.get $j) (i32.const 3)))))))
            (local.set $j (i32.add (local.get $j) (i32.const 2)))
            (br $js2)))
          (if (i32.lt_s (local.get $j) (local.get $kEnd)) (then
            (f64.store (i32.add (local.get $ri) (i32.shl (local.get $j) (i32.const 3)))
              (f64.sub (f64.load (i32.add (local.get $ri) (i32.shl (local.get $j) (i32.const 3))))
                (f64.mul (local.get $l) (f64.load (i32.add (local.get $rk) (i32.shl (local.get $j) (i32.const 3)))))))))))
        (if (i32.lt_s (local.get $next) (local.get $kEnd)) (then
          (local.set $v (f64.abs (f64.load (i32.add (local.get $ri) (i32.shl (local.get $next) (i32.const 3))))))
          (if (i32.or (i32.eq (local.get $i) (local.get $next)) (f64.gt (local.get $v) (local.get $nextBig)))
            (then (local.set $nextBig (local.get $v)) (local.set $nextP (local.get $i))))))
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br $rows)))
      (local.set $p (local.get $nextP))
      (local.set $big (local.get $nextBig))
      (local.set $k (i32.add (local.get $k) (i32.const 1)))
      (br $cols)))
    (i32.const -1)
  )
;; The index of the first element of a[0 .. count - 1] that is not finite (x - x is not 0: an
  ;; infinity or a NaN), or -1; two at a time.
  (func (export "firstNonFinite") (param $count i32) (result i32)
    (local $i i32) (local $x f64)
    (block $done_pairs (loop $pairs
      (br_if $done_pairs (i32.ge_u (i32.add (local.get $i) (i32.const 1)) (local.get $count)))
      (br_if $done_pairs (i32.eqz (i64x2.all_true (f64x2.eq
        (f64x2.sub (v128.load (i32.shl (local.get $i) (i32.const 3))) (v128.load (i32.shl (local.get $i) (i32.const 3))))
        (v128.const i64x2 0 0)))))
      (local.set $i (i32.add (local.get $i) (i32.const 2)))
      (br $pairs)))
    (block $done (loop $singles
      (br_if $done (i32.ge_u (local.get $i) (local.get $count)))
      (local.set $x (f64.load (i32.shl (local.get $i) (i32.const 3))))
      (if (f64.ne (f64.sub (local.get $x) (local.get $x)) (f64.const 0)) (then (return (local.get $i))))
      (local.set $i (i32.add (local.get $i) (i32.const 1)))
      (br $singles)))
    (i32.const -1)
  )
)
