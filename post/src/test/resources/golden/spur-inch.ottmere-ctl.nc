; program 7300 spur-inch
; Hobwright hobbing program - a starting point to be proved out
; Part DR-32 dial drive gear
; Job spur-inch date 2026-12-01 Hobwright 0.1.0-test
; Machine varrow-1605 dialect ottmere-ctl units in
; Gear z 32 DP 32/in pressure angle 20.0000 deg spur x 0.0000 face 0.2500 in
; Tip dia 1.0625 ref dia 1.0000 root dia 0.9210 in
; Hob DP 32/in 1 start right hand OD 1.2500 in 12 gashes hss lead angle 1.5292
; deg
; Swivel angle -1.5292 deg = -1 deg 31 min 45.2 sec
; Swivel setting -1 deg 30 min: swing the bottom of the hob toward the main
; spindle by 1 deg 30 min
; Blank dia 1.0625 touch-off dia 1.0625 final dia 0.9210 in
; Cutting speed 262.5 ft/min hob 802.0 rpm work 25.064 rpm
; Ratio hob:work 32:1
; Hob spindle clockwise seen from its drive end
; Work spindle clockwise seen from the front face of the gear
; Feed from the front face toward the chuck climb hobbing
; Passes 1 finish feed 0.02000 in/rev cycle time 79.7 s
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
G20 G18 G8 G40 G90
G95
G54
G0 X0.6299
T5 M6 G43
; Pass 1 of 1: full depth, climb
M8
G0 X0.5713 Z0.3289
S25.1 M4
M173 P802.
M171 P32 Q1
G4 P1.5
G0 X0.4605 Z0.3289
G1 X0.4605 Z-0.29 F0.02
G0 X0.5713 Z-0.29
M170
M175
M5
G0 X0.5713 Z0.3289
M9
G0 X0.6299
G28
M30
