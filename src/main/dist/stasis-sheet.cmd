@echo off
rem Stasis Sheet launcher (Windows). Runs stasis-sheet.jar, which sits beside this script, with the start-up
rem options that measured as worth it (src\bench\RESULTS.md): the quick C1 compiler only, the serial collector
rem and the class-data archive stasis-sheet.jsa when it is present (the JVM's own checks refuse a stale one
rem quietly). Without arguments the form opens, with the same options (src\bench\RESULTS.md: the quick compiler
rem shows the first worksheet sooner and keeps edits well within their target).
rem   stasis-sheet --make-archive COMMAND ARGS...   (re)build stasis-sheet.jsa by running COMMAND once, e.g.
rem   stasis-sheet --make-archive pdf samples\igm-symptomatic.json -o %TEMP%\training.pdf
rem JAVA_HOME picks the Java runtime; STASIS_JAVA_OPTS adds JVM options.
rem Decision support only: it supports, and never replaces, clinical judgement, local protocols and licensed practice.
rem Blocks in parentheses are avoided on purpose: a ")" in a folder name would end them early.
setlocal
set "HERE=%~dp0"
set "JAR=%HERE%stasis-sheet.jar"
set "ARCHIVE=%HERE%stasis-sheet.jsa"
set "PARTIAL=%HERE%stasis-sheet.jsa.partial"
set "JAVA=java"
if defined JAVA_HOME set "JAVA=%JAVA_HOME%\bin\java"
set "QUIET=-Xlog:cds=off -Xlog:cds+dynamic=off"
set "FAST=-XX:TieredStopAtLevel=1 -XX:+UseSerialGC -XX:-UsePerfData"
if not exist "%JAR%" goto no_jar
if "%~1"=="--make-archive" goto make_archive

rem CDS messages go to standard output by default and would spoil --json output, so they are switched off.
rem Only a complete archive is ever under this name: --make-archive checks it before renaming it.
set "SHARE="
if exist "%ARCHIVE%" set SHARE="-XX:SharedArchiveFile=%ARCHIVE%" %QUIET%
if "%~1"=="" goto form
"%JAVA%" %FAST% -Xshare:auto %SHARE% %STASIS_JAVA_OPTS% -jar "%JAR%" %*
exit /b %ERRORLEVEL%

:form
"%JAVA%" %FAST% -Xshare:auto %SHARE% %STASIS_JAVA_OPTS% -jar "%JAR%"
exit /b %ERRORLEVEL%

:no_jar
echo stasis-sheet: "%JAR%" is missing; build it with 'mvn -q package' 1>&2
exit /b 1

:make_archive
shift
if "%~1"=="" goto no_training
set "ARGS="
:collect
if "%~1"=="" goto train
set ARGS=%ARGS% %1
shift
goto collect

:train
if exist "%ARCHIVE%" del /q "%ARCHIVE%"
if exist "%PARTIAL%" del /q "%PARTIAL%"
"%JAVA%" %FAST% "-XX:ArchiveClassesAtExit=%PARTIAL%" %QUIET% -jar "%JAR%" %ARGS% >nul 2>&1
if errorlevel 1 goto training_failed
"%JAVA%" "-XX:SharedArchiveFile=%PARTIAL%" -Xshare:on -XX:+UseSerialGC -jar "%JAR%" --version >nul 2>&1
if errorlevel 1 goto archive_unusable
move /y "%PARTIAL%" "%ARCHIVE%" >nul
echo stasis-sheet: wrote "%ARCHIVE%"
exit /b 0

:no_training
echo stasis-sheet: give a command to train on, e.g. stasis --make-archive pdf CASE.json -o training.pdf 1>&2
exit /b 2

:training_failed
if exist "%PARTIAL%" del /q "%PARTIAL%"
echo stasis-sheet: the training run exited with an error; no archive written 1>&2
exit /b 1

:archive_unusable
del /q "%PARTIAL%"
echo stasis-sheet: the new archive could not be used; none kept 1>&2
exit /b 1
