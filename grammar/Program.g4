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
NUMBER      : '0' [xX] [0-9a-fA-F_]+
            | '0' [bB] [01_]+
            | [0-9] [0-9_]*
            ;
NAME        : [A-Za-z_] [A-Za-z0-9_]* ;
COMMENT     : ';' ~[\r\n]* -> skip ;
WS          : [ \t\r\n]+ -> skip ;
ANY         : . ;
