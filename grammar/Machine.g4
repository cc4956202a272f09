// Thermion machine description language (.machine files).
// Declarations are either generic property blocks (tube, stage, rail, heaters,
// softstart, realize, machine), logic modules, or an isa block. No actions here:
// the AST builder in org.thermion.lang gives the parse tree its meaning.
grammar Machine;

file        : sep? (decl (sep decl)* sep?)? EOF ;
sep         : (NL | ';')+ ;

decl        : INCLUDE STRING                                     # includeDecl
            | MODULE ident '{' moduleBody '}'                     # moduleDecl
            | ISA ident? '{' isaBody '}'                          # isaDecl
            | prop                                                # propDecl
            ;

// ---- generic properties: `key value value ... { nested }`
prop        : ident value* propBlock? ;
propBlock   : '{' sep? (prop (sep prop)* sep?)? '}' ;
value       : NUMBER | ident | keyword | STRING | '-' | '..' | ':' | '=' | ',' | '.' | '*' | '+' | '[' | ']' ;

// ---- logic modules
moduleBody  : sep? (mstmt (sep mstmt)* sep?)? ;
mstmt       : dir=(IN | OUT) portDecl (',' portDecl)*                               # portsStmt
            | NET netDecl (',' netDecl)* ('=' expr)?                                # netStmt
            | CONST ident '=' expr                                                  # constStmt
            | LATCH ident width? (ON PHASE expr)? (WHEN expr)? (USING ident)? '=' expr # latchStmt
            | lvalue '=' expr                                                       # assignStmt
            | USE ident AS ident '(' (conn (',' conn)*)? ')'                        # useStmt
            | FOR ident IN expr '..' expr '{' moduleBody '}'                        # forStmt
            ;
portDecl    : ident width? ;
netDecl     : ident width? ;
width       : '[' expr ']' ;
lvalue      : ident index? ;
index       : '[' expr ('..' expr)? ']' ;
conn        : ident ':' expr ;

expr        : '(' expr ')'                              # parenExpr
            | '!' expr                                  # notExpr
            | '-' expr                                  # negExpr
            | expr op=('*' | '/' | '%') expr            # mulExpr
            | expr op=('+' | '-') expr                  # addExpr
            | expr '==' expr                            # eqExpr
            | expr '&' expr                             # andExpr
            | expr '^' expr                             # xorExpr
            | expr '|' expr                             # orExpr
            | ident '(' (expr (',' expr)*)? ')'         # callExpr
            | ident index?                              # refExpr
            | NUMBER                                    # numExpr
            | '{' expr (',' expr)* '}'                  # concatExpr
            ;

// ---- instruction set
isaBody     : sep? (istmt (sep istmt)* sep?)? ;
istmt       : OP ident expr '{' rbody '}'               # opStmt
            | prop                                      # isaPropStmt
            ;
rbody       : sep? (rstmt (sep rstmt)* sep?)? ;
rstmt       : rtarget '<-' rexpr                                     # rAssign
            | IF rexpr '{' rbody '}' (ELSE '{' rbody '}')?           # rIf
            ;
rtarget     : ident | '[' ident ']' ;
rexpr       : '(' rexpr ')'                             # rParen
            | '!' rexpr                                 # rNot
            | rexpr op=('+' | '-') rexpr                # rAdd
            | rexpr '&' rexpr                           # rAnd
            | rexpr '^' rexpr                           # rXor
            | rexpr '|' rexpr                           # rOr
            | '[' ident ']'                             # rSelect
            | ident                                     # rRef
            | NUMBER                                    # rNum
            ;

keyword     : MODULE | ISA | INCLUDE | NET | USE | FOR | IF | ELSE ;

// Soft keywords stay usable as names.
ident       : NAME | ON | PHASE | WHEN | USING | AS | OP | CONST | LATCH | IN | OUT ;

INCLUDE     : 'include' ;
MODULE      : 'module' ;
ISA         : 'isa' ;
IN          : 'in' ;
OUT         : 'out' ;
NET         : 'net' ;
CONST       : 'const' ;
LATCH       : 'latch' ;
ON          : 'on' ;
PHASE       : 'phase' ;
WHEN        : 'when' ;
USING       : 'using' ;
USE         : 'use' ;
AS          : 'as' ;
FOR         : 'for' ;
OP          : 'op' ;
IF          : 'if' ;
ELSE        : 'else' ;

NUMBER      : '0x' [0-9a-fA-F_]+
            | '0b' [01_]+
            | [0-9]+ ('.' [0-9]+)? ([eE] [+-]? [0-9]+)?
            ;
NAME        : [A-Za-z0-9_]+ ;
STRING      : '"' (~["\r\n\\] | '\\' .)* '"' ;
COMMENT     : '#' ~[\r\n]* -> skip ;
NL          : '\r'? '\n' ;
WS          : [ \t]+ -> skip ;
ARROW       : '<-' ;
EQEQ        : '==' ;
DOTDOT      : '..' ;
ANY         : . ;
