; program 7300 helical-metric
; Hobwright hobbing program - a starting point to be proved out
; Part HX-30 pump drive gear
; Job helical-metric date 2026-12-01 Hobwright 0.1.0-test
; Machine ottmere-4008 dialect ottmere-ctl units mm
; Gear z 30 module 2 mm pressure angle 20.0000 deg helix 15.0000 deg right hand
; x 0.2000 face 20.000 mm
; Tip dia 66.917 ref dia 62.117 root dia 57.917 mm
; Hob module 2 mm 1 start right hand OD 70.000 mm 14 gashes hss-coated lead
; angle 1.7632 deg
; Swivel angle 13.2368 deg = 13 deg 14 min 12.4 sec
; Swivel setting -13.237 deg: turn the hob head clockwise seen from the operator
; side by 13.237 deg
; Blank dia 66.917 touch-off dia 66.917 final dia 57.917 mm
; Cutting speed 60.0 m/min hob 272.8 rpm work 9.095 rpm
; Ratio hob:work 30:1 helical addition 0.494308 deg/mm
; Hob spindle clockwise seen from its drive end
; Work spindle counter-clockwise seen from the front face of the gear
; Feed from the front face toward the chuck climb hobbing
; Passes 1 finish feed 1.5000 mm/rev cycle time 209.0 s
; Caution: rotating multi-tooth cutter and synchronised spindles.
; Keep the guards closed and never reach into the working area while the
; spindles are locked together.
; Prove the program out in single block at reduced feed and speed override
; before the first part.
; Check every word of this program against the machine builder's and control
; builder's manuals.
; Follow the machine builder's manual, local codes and your shop's licensed
; practice.
; Cutting data are typical values: confirm them with the hob supplier.
G21 G18 G8 G40 G90
G95
G54
G0 X60.
T5 M6 G43
; Pass 1 of 1: full depth, climb, helical addition on
M8
G0 A-13.237
M157 P0.5
G0 X35.459 Z20.133
S9.1 M3
M173 P272.8
M171 P30 Q1
M172 P0.494308
G4 P2.
G0 X28.959 Z20.133
G1 X28.959 Z-24.831 F1.5
G0 X35.459 Z-24.831
M170
M175
M5
G0 X35.459 Z20.133
M9
G0 X60.
G28
M30
