// Thermion assembly language (.asm files): one statement a line.
//   [label:] [MNEMONIC [operand]] [; comment]
//   [label:] .DIRECTIVE [NAME =] [value] [; comment]
// The reader parses each line on its own (rule `line`), so a broken line cannot
// hide the errors of the lines after it. Mnemonics and directive names are checked
// against the machine's ISA by the assembler, not here.
grammar Program;

line        : (label=NAME ':')? stmt? EOF ;

stmt        : DIRECTIVE (NAME '=')? expr?                  # directiveStmt
            | NAME expr?                                   # instructionStmt
            ;

expr        : '(' expr ')'                                 # parenExpr
            | '-' expr                                     # negExpr
            | expr op=('*' | '/') expr                     # mulExpr
            | expr op=('+' | '-') expr                     # addExpr
            | NAME                                         # nameExpr
            | NUMBER                                       # numExpr
            ;

DIRECTIVE   : '.' [A-Za-z_] [A-Za-z0-9_]* ;
// Anything that starts with a digit is one number token (0x1F, 0b101, 31, 1_000); the
// reader checks its digits, so `0x` or `12ab` get a clear message rather than a split token.
NUMBER      : [0-9] [0-9a-zA-Z_]* ;
NAME        : [A-Za-z_] [A-Za-z0-9_]* ;
COMMENT     : ';' ~[\r\n]* -> skip ;
WS          : [ \t\r\n]+ -> skip ;
ANY         : . ;
