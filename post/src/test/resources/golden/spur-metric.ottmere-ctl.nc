; program 7300 spur-metric
; Hobwright hobbing program - a starting point to be proved out
; Part SP-20 idler gear
; Job spur-metric date 2026-12-01 Hobwright 0.1.0-test
; Machine ottmere-4008 dialect ottmere-ctl units mm
; Gear z 20 module 2 mm pressure angle 20.0000 deg spur x 0.0000 face 20.000 mm
; Tip dia 44.000 ref dia 40.000 root dia 35.000 mm
; Hob module 2 mm 1 start right hand OD 70.000 mm 14 gashes hss-coated lead
; angle 1.7632 deg
; Swivel angle -1.7632 deg = -1 deg 45 min 47.6 sec
; Swivel setting 1.763 deg: turn the hob head counter-clockwise seen from the
; operator side by 1.763 deg
; Blank dia 44.000 touch-off dia 44.000 final dia 35.000 mm
; Cutting speed 60.0 m/min hob 272.8 rpm work 13.642 rpm
; Ratio hob:work 20:1
; Hob spindle clockwise seen from its drive end
; Work spindle counter-clockwise seen from the front face of the gear
; Feed from the front face toward the chuck climb hobbing
; Passes 1 finish feed 1.5000 mm/rev cycle time 130.9 s
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
; Pass 1 of 1: full depth, climb
M8
G0 A1.763
M157 P0.
G0 X24. Z19.169
S13.6 M3
M173 P272.8
M171 P20 Q1
G4 P2.
G0 X17.5 Z19.169
G1 X17.5 Z-22. F1.5
G0 X24. Z-22.
M170
M175
M5
G0 X24. Z19.169
M9
G0 X60.
G28
M30
