;; The inner loop of roundKernel.ts for a horizontal plane lit from above, two cells at a time
;; (WebAssembly SIMD, f64x2). It does exactly what the JavaScript loop does, operation for operation
;; and in the same order (IEEE 754 arithmetic per lane), so the two give the same bits; tests compare
;; them. Per cell: d² = dx² + (dy² + dz²); 1/d = 1 / sqrt(d²); cos θ = (dx·ax + along) / d; cells
;; with cos θ ≤ cos θe get nothing; position = (1 − cos θ)·scale; below `deferBelow` the cell is
;; written to the near-axis list for JavaScript (fine table or closed form); otherwise the table's
;; degree-5 piece at u = 2·(position − slot) − 1 by Estrin's scheme, and
;; values[cell] += scaled·f·(1/d)·(1/d)·(1/d).
;;
;; Rows come as 32-byte records: f64 dy² + dz², f64 along (dy·ay + dz·az), i32 first cell index of
;; the row, i32 first column, i32 last column. A pair's second cell past the last column is masked
;; (it adds 0; the values area has one spare cell at its end). Near-axis cells are written as i32
;; pairs (record number, column); the count is returned.
;;
;; Built into simdRowsModule.ts by `npm run wasm` (wabt); a test checks the two agree.
(module
  (memory (export "memory") 1)
  (func (export "lightRows")
    (param $x0 f64) (param $spacing f64) (param $ax f64) (param $cosEdge f64)
    (param $positionScale f64) (param $deferBelow f64) (param $scaled f64) (param $maxPosition f64)
    (param $coefficients i32) (param $values i32) (param $rows i32) (param $rowCount i32) (param $near i32)
    (result i32)
    (local $r i32) (local $rec i32) (local $rowStart i32) (local $col i32) (local $last i32) (local $count i32)
    (local $a0 i32) (local $a1 i32) (local $address i32)
    (local $x0v v128) (local $spacingv v128) (local $axv v128) (local $cosEdgev v128) (local $scalev v128)
    (local $deferv v128) (local $scaledv v128) (local $maxv v128) (local $one v128) (local $two v128)
    (local $dydz v128) (local $along v128) (local $lastF v128) (local $colF v128) (local $dx v128)
    (local $inv v128) (local $cos v128) (local $lit v128) (local $pos v128) (local $defer v128) (local $use v128)
    (local $slots v128) (local $u v128) (local $u2 v128) (local $rel v128)
    (local.set $x0v (f64x2.splat (local.get $x0)))
    (local.set $spacingv (f64x2.splat (local.get $spacing)))
    (local.set $axv (f64x2.splat (local.get $ax)))
    (local.set $cosEdgev (f64x2.splat (local.get $cosEdge)))
    (local.set $scalev (f64x2.splat (local.get $positionScale)))
    (local.set $deferv (f64x2.splat (local.get $deferBelow)))
    (local.set $scaledv (f64x2.splat (local.get $scaled)))
    (local.set $maxv (f64x2.splat (local.get $maxPosition)))
    (local.set $one (f64x2.splat (f64.const 1)))
    (local.set $two (f64x2.splat (f64.const 2)))
    (block $rowsDone
      (loop $rowLoop
        (br_if $rowsDone (i32.ge_u (local.get $r) (local.get $rowCount)))
        (local.set $rec (i32.add (local.get $rows) (i32.shl (local.get $r) (i32.const 5))))
        (local.set $dydz (f64x2.splat (f64.load (local.get $rec))))
        (local.set $along (f64x2.splat (f64.load offset=8 (local.get $rec))))
        (local.set $rowStart (i32.load offset=16 (local.get $rec)))
        (local.set $col (i32.load offset=20 (local.get $rec)))
        (local.set $last (i32.load offset=24 (local.get $rec)))
        (local.set $lastF (f64x2.splat (f64.convert_i32_s (local.get $last))))
        (block $colsDone
          (loop $colLoop
            (br_if $colsDone (i32.gt_s (local.get $col) (local.get $last)))
            (local.set $colF (f64x2.add (f64x2.splat (f64.convert_i32_s (local.get $col))) (v128.const f64x2 0 1)))
            (local.set $dx (f64x2.add (local.get $x0v) (f64x2.mul (local.get $colF) (local.get $spacingv))))
            (local.set $inv
              (f64x2.div (local.get $one)
                (f64x2.sqrt (f64x2.add (f64x2.mul (local.get $dx) (local.get $dx)) (local.get $dydz)))))
            (local.set $cos
              (f64x2.mul (f64x2.add (f64x2.mul (local.get $dx) (local.get $axv)) (local.get $along)) (local.get $inv)))
            (local.set $lit
              (v128.and (f64x2.gt (local.get $cos) (local.get $cosEdgev)) (f64x2.le (local.get $colF) (local.get $lastF))))
            (if (v128.any_true (local.get $lit))
              (then
                (local.set $pos (f64x2.mul (f64x2.sub (local.get $one) (local.get $cos)) (local.get $scalev)))
                (local.set $defer (v128.and (local.get $lit) (f64x2.lt (local.get $pos) (local.get $deferv))))
                (local.set $use (local.get $lit))
                (if (v128.any_true (local.get $defer))
                  (then
                    (if (i64.ne (i64x2.extract_lane 0 (local.get $defer)) (i64.const 0))
                      (then
                        (local.set $address (i32.add (local.get $near) (i32.shl (local.get $count) (i32.const 3))))
                        (i32.store (local.get $address) (local.get $r))
                        (i32.store offset=4 (local.get $address) (local.get $col))
                        (local.set $count (i32.add (local.get $count) (i32.const 1)))))
                    (if (i64.ne (i64x2.extract_lane 1 (local.get $defer)) (i64.const 0))
                      (then
                        (local.set $address (i32.add (local.get $near) (i32.shl (local.get $count) (i32.const 3))))
                        (i32.store (local.get $address) (local.get $r))
                        (i32.store offset=4 (local.get $address) (i32.add (local.get $col) (i32.const 1)))
                        (local.set $count (i32.add (local.get $count) (i32.const 1)))))
                    (local.set $use (v128.andnot (local.get $lit) (local.get $defer)))))
                (local.set $pos (f64x2.pmin (local.get $pos) (local.get $maxv)))
                (local.set $slots (i32x4.trunc_sat_f64x2_s_zero (local.get $pos)))
                (local.set $u
                  (f64x2.sub
                    (f64x2.mul (local.get $two) (f64x2.sub (local.get $pos) (f64x2.convert_low_i32x4_s (local.get $slots))))
                    (local.get $one)))
                (local.set $u2 (f64x2.mul (local.get $u) (local.get $u)))
                (local.set $a0 (i32.add (local.get $coefficients) (i32.mul (i32x4.extract_lane 0 (local.get $slots)) (i32.const 48))))
                (local.set $a1 (i32.add (local.get $coefficients) (i32.mul (i32x4.extract_lane 1 (local.get $slots)) (i32.const 48))))
                (local.set $rel
                  (f64x2.add
                    (f64x2.add
                      (v128.load64_lane 1 (local.get $a1) (v128.load64_zero (local.get $a0)))
                      (f64x2.mul (local.get $u) (v128.load64_lane offset=8 1 (local.get $a1) (v128.load64_zero offset=8 (local.get $a0)))))
                    (f64x2.mul (local.get $u2)
                      (f64x2.add
                        (f64x2.add
                          (v128.load64_lane offset=16 1 (local.get $a1) (v128.load64_zero offset=16 (local.get $a0)))
                          (f64x2.mul (local.get $u) (v128.load64_lane offset=24 1 (local.get $a1) (v128.load64_zero offset=24 (local.get $a0)))))
                        (f64x2.mul (local.get $u2)
                          (f64x2.add
                            (v128.load64_lane offset=32 1 (local.get $a1) (v128.load64_zero offset=32 (local.get $a0)))
                            (f64x2.mul (local.get $u) (v128.load64_lane offset=40 1 (local.get $a1) (v128.load64_zero offset=40 (local.get $a0))))))))))
                (local.set $address
                  (i32.add (local.get $values) (i32.shl (i32.add (local.get $rowStart) (local.get $col)) (i32.const 3))))
                (v128.store (local.get $address)
                  (f64x2.add (v128.load (local.get $address))
                    (v128.and (local.get $use)
                      (f64x2.mul (f64x2.mul (f64x2.mul (f64x2.mul (local.get $scaledv) (local.get $rel)) (local.get $inv)) (local.get $inv)) (local.get $inv)))))))
            (local.set $col (i32.add (local.get $col) (i32.const 2)))
            (br $colLoop)))
        (local.set $r (i32.add (local.get $r) (i32.const 1)))
        (br $rowLoop)))
    (local.get $count)))
